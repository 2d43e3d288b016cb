/**
 * The editor features of the language layer: pure functions of an `Analysis`
 * (its `syntax` facts and text) and an offset, returning plain data with spans.
 * The LSP server translates them (server/src/lsp/features.ts).
 */
export { completionsAt, type Completion, type CompletionKind, type CompletionOptions } from './completion.js';
export { signatureHelpAt, type Signature, type SignatureHelp, type SignatureParameter } from './signature-help.js';
export { definitionAt } from './definition.js';
export { referencesAt } from './references.js';
export { prepareRenameAt, renameAt, type PrepareRename, type Rename } from './rename.js';
export { documentSymbols, type OutlineEntry, type OutlineKind } from './document-symbols.js';
export {
  semanticTokens,
  SEMANTIC_TOKEN_MODIFIERS,
  SEMANTIC_TOKEN_TYPES,
  type SemanticToken,
  type SemanticTokenModifier,
  type SemanticTokenType,
} from './semantic-tokens.js';
export { foldingRanges, type Fold } from './folding.js';
export { formatDocument, formatText } from './formatting.js';
