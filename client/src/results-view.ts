/**
 * The results view: every result of the active .wedge file (name, kind,
 * value, convention), in the Explorer. The server sends the list after each
 * analysis (`wedgework/results`); clicking an item reveals its statement.
 * The view keeps showing the last .wedge file while another kind of editor
 * is active, as the file it describes is still open.
 */
import * as vscode from 'vscode';
import type { LanguageClient, StaticFeature } from 'vscode-languageclient/node';
import {
  RESULTS_CAPABILITY,
  RESULTS_NOTIFICATION,
  type ResultItem,
  type ResultsParams,
} from '../../server/src/lsp/results-protocol.js';
import { presentResult, RESULTS_VIEW_ID, VIEW_ENABLED_CONTEXT, viewMessage } from './results-labels.js';

/** Tells the server that this client wants `wedgework/results` (an experimental client capability). */
const resultsCapability: StaticFeature = {
  fillClientCapabilities(capabilities) {
    capabilities.experimental = { ...(capabilities.experimental as object | undefined), [RESULTS_CAPABILITY]: true };
  },
  initialize() {},
  getState: () => ({ kind: 'static' }),
  clear() {},
};

class ResultsTree implements vscode.TreeDataProvider<ResultItem> {
  private readonly byUri = new Map<string, ResultsParams>();
  private shownUri: string | undefined;
  private readonly changed = new vscode.EventEmitter<void>();
  readonly onDidChangeTreeData = this.changed.event;

  constructor(
    private readonly client: LanguageClient,
    private readonly onShownChange: () => void,
  ) {}

  update(params: ResultsParams): void {
    if (params.results.length === 0 && params.evaluatedVersion === undefined) this.byUri.delete(params.uri);
    else this.byUri.set(params.uri, params);
    if (this.shownUri === undefined) this.shownUri = params.uri;
    if (params.uri === this.shownUri) this.refresh();
  }

  show(uri: string): void {
    if (uri === this.shownUri) return;
    this.shownUri = uri;
    this.refresh();
  }

  shown(): { uri: string | undefined; params: ResultsParams | undefined } {
    return { uri: this.shownUri, params: this.shownUri === undefined ? undefined : this.byUri.get(this.shownUri) };
  }

  getTreeItem(item: ResultItem): vscode.TreeItem {
    const presented = presentResult(item);
    const treeItem = new vscode.TreeItem(presented.label, vscode.TreeItemCollapsibleState.None);
    treeItem.description = presented.description;
    treeItem.tooltip = presented.tooltip;
    treeItem.iconPath = new vscode.ThemeIcon(presented.icon);
    if (this.shownUri !== undefined) {
      const range = this.client.protocol2CodeConverter.asRange(item.range);
      treeItem.command = {
        title: 'Go to the statement',
        command: 'vscode.open',
        arguments: [vscode.Uri.parse(this.shownUri), { selection: new vscode.Range(range.start, range.start) }],
      };
    }
    return treeItem;
  }

  getChildren(element?: ResultItem): ResultItem[] {
    if (element || this.shownUri === undefined) return [];
    return this.byUri.get(this.shownUri)?.results ?? [];
  }

  dispose(): void {
    this.changed.dispose();
  }

  private refresh(): void {
    this.changed.fire();
    this.onShownChange();
  }
}

/** Adds the results view. Call before the client starts (it declares a client capability). */
export function registerResultsView(context: vscode.ExtensionContext, client: LanguageClient): void {
  client.registerFeature(resultsCapability);
  let view: vscode.TreeView<ResultItem> | undefined;
  const tree = new ResultsTree(client, () => {
    if (!view) return;
    const { uri, params } = tree.shown();
    view.description = uri === undefined ? undefined : decodeURIComponent(uri.slice(uri.lastIndexOf('/') + 1));
    view.message = viewMessage(params);
  });
  view = vscode.window.createTreeView(RESULTS_VIEW_ID, { treeDataProvider: tree });
  const showEditor = (editor: vscode.TextEditor | undefined) => {
    if (editor?.document.languageId === 'wedge') tree.show(editor.document.uri.toString());
  };
  showEditor(vscode.window.activeTextEditor);
  context.subscriptions.push(
    view,
    tree,
    client.onNotification(RESULTS_NOTIFICATION, (params: ResultsParams) => tree.update(params)),
    vscode.window.onDidChangeActiveTextEditor(showEditor),
  );
  void vscode.commands.executeCommand('setContext', VIEW_ENABLED_CONTEXT, true);
}
