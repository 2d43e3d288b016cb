/**
 * The inputs the facade is fuzzed with: the sample files cut at many offsets,
 * mutated with a seeded generator, spliced together, and a fixed list of
 * hostile documents (huge numbers, deep nesting, long lines and chains,
 * unusual Unicode, every kind of line ending, exponential blow-ups).
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { SeededRandom } from './seeded-random.js';

export interface FuzzInput {
  /** Where the input came from, for reports. */
  label: string;
  text: string;
}

const SAMPLES_DIR = join(import.meta.dirname, '..', '..', 'samples');

export function sampleFiles(): FuzzInput[] {
  return readdirSync(SAMPLES_DIR)
    .filter((f) => f.endsWith('.wedge'))
    .sort()
    .map((f) => ({ label: f, text: readFileSync(join(SAMPLES_DIR, f), 'utf8') }));
}

/** The sample cut at `count` offsets spread over its length (each jittered a little), plus the empty prefix. */
export function truncations(sample: FuzzInput, count: number, random: SeededRandom): FuzzInput[] {
  const out: FuzzInput[] = [];
  const length = sample.text.length;
  for (let i = 0; i < count; i++) {
    const base = Math.floor(((i + 1) * length) / (count + 1));
    const offset = Math.max(0, Math.min(length, base + random.between(-8, 8)));
    out.push({ label: `${sample.label} cut at ${offset}`, text: sample.text.slice(0, offset) });
  }
  return out;
}

/** Words and symbols of the language and its neighbours, inserted by mutations. */
const VOCABULARY = [
  'space', 'vector', 'subspace', 'multivector', 'claim', 'show', 'field', 'normalize', 'convention', 'map', 'flag',
  'dim', 'basis', 'in', 'not', 'is', 'rows', 'columns', 'solutions', 'decomposable', 'generator',
  'span(', 'plucker(', 'chart(', 'recover(', 'complement(', 'annihilator(', 'quotient(', 'kernel(', 'image(',
  'compound(', 'schubert(', 'matroid(', 'positivity(', 'count(', 'subspaces(', 'min_distance(', 'meet(',
  '(', ')', '[', ']', '{', '}', ',', ';', ':', '.', '=', '!=', '≠', '+', '-', '*', '/', '^', '∧', '&', '∩', '∈', '∉',
  '->', '→', '#', '\n', '\r\n', '\r', '\t', ' ', '0', '1', '13', '-1/2', '0.125', '1/0', 'e1', 'e0', 'e99', 'V', 'W', 'p',
  'GF(7)', 'GF(4)', 'QQ', 'colex', 'labels 0', 'layout columns', 'first-one', 'totally', 'positive', 'uniform',
  '\u0000', '\ufeff', '\u202e', '\u200d', '\u0301', '\ud800', '\udfff', '😀', '𝑥', 'η', 'ا', '\u2028', '\u0085', '１２',
];

/** One random edit: a flipped bit in a character, a deletion, a duplication, an insertion, or a line swap. */
function mutateOnce(text: string, random: SeededRandom): string {
  const at = random.below(text.length + 1);
  switch (random.below(8)) {
    case 0: {
      if (text.length === 0) return text;
      // Flip one of the 16 bits of a UTF-16 unit: may yield a lone surrogate, NUL or a control character.
      const i = Math.min(at, text.length - 1);
      return text.slice(0, i) + String.fromCharCode(text.charCodeAt(i) ^ (1 << random.below(16))) + text.slice(i + 1);
    }
    case 1:
      return text.slice(0, at) + text.slice(at + random.between(1, 40));
    case 2: {
      const piece = text.slice(at, at + random.between(1, 60));
      return text.slice(0, at) + piece + piece + text.slice(at + piece.length);
    }
    case 3:
    case 4:
      return text.slice(0, at) + random.pick(VOCABULARY) + text.slice(at);
    case 5: {
      const lines = text.split('\n');
      const a = random.below(lines.length);
      const b = random.below(lines.length);
      [lines[a], lines[b]] = [lines[b]!, lines[a]!];
      return lines.join('\n');
    }
    case 6:
      // A digit becomes a long number.
      return text.replace(/\d/, () => String(random.between(1, 9)).repeat(random.between(20, 400)));
    default:
      return text.slice(0, at) + String.fromCharCode(random.below(0x10000)) + text.slice(at);
  }
}

export function mutations(sample: FuzzInput, count: number, random: SeededRandom): FuzzInput[] {
  const out: FuzzInput[] = [];
  for (let i = 0; i < count; i++) {
    let text = sample.text;
    const edits = random.between(1, 6);
    for (let e = 0; e < edits; e++) text = mutateOnce(text, random);
    out.push({ label: `${sample.label} with ${edits} random edits (#${i})`, text });
  }
  return out;
}

/** Documents glued from random runs of lines of all samples. */
export function splices(samples: readonly FuzzInput[], count: number, random: SeededRandom): FuzzInput[] {
  const lines = samples.flatMap((s) => s.text.split('\n'));
  const out: FuzzInput[] = [];
  for (let i = 0; i < count; i++) {
    const parts: string[] = [];
    const runs = random.between(1, 8);
    for (let r = 0; r < runs; r++) {
      const start = random.below(lines.length);
      parts.push(...lines.slice(start, start + random.between(1, 12)));
    }
    out.push({ label: `splice #${i}`, text: parts.join(random.pick(['\n', '\r\n', '\n\n'])) });
  }
  return out;
}

const digits = (count: number, digit = '7') => '1' + digit.repeat(count - 1);
const HEADER = 'space V dim 4\nvector p = (1, 0, 2, -1)\nsubspace W = span(p, e2)\n';

/** Hostile documents of a fixed shape; each must come back with problems, never an exception. */
export function hostileDocuments(samples: readonly FuzzInput[], longChain: number): FuzzInput[] {
  const big = digits(100_000);
  const generic = (n: number, k: number) =>
    Array.from({ length: k }, (_, i) => `vector v${i} = (${Array.from({ length: n }, (_, j) => (i + 1) ** (j % 5) + j).join(', ')})`).join('\n');
  const docs: FuzzInput[] = [
    { label: 'empty document', text: '' },
    { label: 'only whitespace', text: ' \t\n\r\n\r \f\v' },
    { label: 'only a comment without line end', text: '# a comment' },
    // Huge numbers, 10^5 digits, everywhere a number may stand.
    { label: '10^5-digit coordinate', text: `space V dim 3\nvector v = (${big}, 2, 3)\nsubspace W = span(v, e2)\nshow plucker(W)\nshow chart(W, 12)\n` },
    { label: '10^5-digit fraction', text: `space V dim 2\nvector v = (${big}/${digits(100_000, '3')}, 1)\nshow v\n` },
    { label: '10^5-digit decimal', text: `space V dim 2\nvector v = (0.${'0'.repeat(100_000)}1, 1)\nshow v\n` },
    { label: '10^5-digit dimension', text: `space V dim ${big}\nshow dim V\n` },
    { label: '10^5-digit field order', text: `field GF(${big})\nspace V dim 2\n` },
    { label: '10^5-digit prime-looking field order', text: `field GF(${digits(100_000, '0').slice(0, -1)}7)\nspace V dim 2\n` },
    { label: '10^5-digit label', text: `space V dim 4\nmultivector m = {(1, ${big}): 1}\n` },
    { label: '10^5-digit index key', text: `space V dim 4\nmultivector m = {${big}: 1}\n` },
    { label: '10^5-digit chart index', text: `${HEADER}show chart(W, ${big})\n` },
    { label: '10^5-digit exponent', text: `space V dim 2\nshow 3^${big}\n` },
    { label: 'power of a power of a power', text: 'space V dim 2\nshow ((7^1000)^1000)^1000\n' },
    { label: 'power 3^(10^7)', text: 'space V dim 2\nshow 3^10000000\n' },
    { label: '10^5-digit count argument', text: `field GF(2)\nspace V dim 4\nshow count(${big}, V)\nshow subspaces(${big}, V)\n` },
    { label: '10^5-digit compound order', text: `space V dim 2\nmap f : V -> V = [1 2\n3 4]\nshow compound(f, ${big})\n` },
    // Deep nesting.
    ...[10, 100, 1000, 10_000].map((d) => ({ label: `${d} nested parentheses`, text: `${HEADER}show ${'('.repeat(d)}1${')'.repeat(d)}\nshow p\n` })),
    { label: '10^4 unclosed parentheses', text: `${HEADER}show ${'('.repeat(10_000)}1\nshow p\n` },
    { label: '10^4 unopened parentheses', text: `${HEADER}show 1${')'.repeat(10_000)}\nshow p\n` },
    { label: '10^4 nested brackets', text: `${HEADER}show ${'['.repeat(10_000)}1${']'.repeat(10_000)}\n` },
    { label: '10^4 nested braces', text: `${HEADER}show ${'{'.repeat(10_000)}12: 1${'}'.repeat(10_000)}\n` },
    { label: '1000 nested spans', text: `${HEADER}show ${'span('.repeat(1000)}p${')'.repeat(1000)}\n` },
    { label: '10^4 unary minus signs', text: `${HEADER}show ${'- '.repeat(10_000)}p\n` },
    { label: '10^4 dims', text: `${HEADER}show ${'dim '.repeat(10_000)}W\n` },
    { label: '1000 nested map applications', text: `${HEADER}map f : V -> V = [0 1 0 0\n0 0 1 0\n0 0 0 1\n1 0 0 0]\nshow ${'f('.repeat(1000)}p${')'.repeat(1000)}\n` },
    // Long chains (flat in the text, deep in the tree).
    { label: `${longChain}-term sum`, text: `${HEADER}show ${Array(longChain).fill('1').join(' + ')}\n` },
    { label: `${longChain}-factor wedge`, text: `${HEADER}show ${Array(longChain).fill('e1').join(' ^ ')}\n` },
    { label: `${longChain} juxtaposed factors`, text: `${HEADER}show ${Array(longChain).fill('2').join(' ')} e1\n` },
    { label: `${longChain / 4} intersections`, text: `${HEADER}show ${Array(longChain / 4).fill('W').join(' & ')}\n` },
    // Long lines.
    { label: '10^5-character comment', text: `# ${'x'.repeat(100_000)}\n${HEADER}` },
    { label: '10^5-character name', text: `space ${'V'.repeat(100_000)} dim 2\nvector ${'v'.repeat(100_000)} = e1\n` },
    { label: '10^5 spaces inside a statement', text: `space V dim 2\nvector v =${' '.repeat(100_000)}e1\n` },
    { label: `${longChain / 10} statements on one line`, text: 'space V dim 3 ' + Array.from({ length: longChain / 10 }, (_, i) => `vector v${i} = (${i}, 1, 0)`).join(' ') },
    { label: 'a 64×64 matrix on one line', text: `space V dim 64\nsubspace W = rows [${Array.from({ length: 64 }, (_, i) => Array.from({ length: 64 }, (_, j) => (i === j ? 1 : (i * j) % 3)).join(' ')).join('; ')}]\nshow W\n` },
    // Unusual Unicode.
    { label: 'combining marks on names', text: 'space V\u0301 dim 2\nvector e\u0301 = (1, 0)\nshow e\u0301\u0308\u20dd\n' },
    { label: 'right-to-left override and Arabic names', text: 'space \u202eV dim 2\nvector ا = (1, 0) # \u202b\u05d0\u05d1\u202c\nshow ا\n' },
    { label: 'lone surrogates', text: 'space V dim 2\nvector \ud800 = (1, 0)\nshow \udfff\n# \ud83d\n' + 'vector w = (1\udc00, 0)\n' },
    { label: 'astral letters and emoji', text: 'space 𝑉 dim 2\nvector 𝑥 = (1, 0)\nshow 𝑥 # 😀😀\nvector 😀 = e1\n' },
    { label: 'NUL characters', text: 'space V dim 2\u0000\nvector v = (1,\u0000 0)\n\u0000show v\n' },
    { label: 'byte order mark and zero-width characters', text: '\ufeffspace V dim 2\nvector v\u200d = (1, 0)\nshow v\u200b\n' },
    { label: 'Unicode line and paragraph separators', text: 'space V dim 2\u2028vector v = (1, 0)\u2029show v\u0085show e1\n' },
    { label: 'full-width and superscript digits', text: 'space V dim ２\nvector v = (１, ⁰)\nshow v\n' },
    { label: 'form feed and vertical tab', text: 'space V dim 2\f\nvector v = (1,\v 0)\nshow v\n' },
    // Exponential blow-ups.
    { label: 'wedge of 15 generic vectors in dimension 30', text: `space V dim 30\n${generic(30, 15)}\nmultivector m = ${Array.from({ length: 15 }, (_, i) => `v${i}`).join(' ^ ')}\nclaim m decomposable\n` },
    { label: 'wedge of 32 basis sums in dimension 64', text: `space V dim 64\nmultivector m = ${Array.from({ length: 32 }, (_, i) => `(e${i + 1} + e${i + 33})`).join(' ^ ')}\n` },
    { label: 'G(32,64) from a basis', text: `space V dim 64\nsubspace W = rows [${Array.from({ length: 32 }, (_, i) => Array.from({ length: 64 }, (_, j) => (i === j ? 1 : 0)).join(' ')).join('; ')}]\nshow plucker(W)\nshow matroid(W)\nshow positivity(W)\n` },
    { label: 'all 3-subspaces of GF(2)^12', text: 'field GF(2)\nspace V dim 12\nshow subspaces(3, V)\nshow count(6, V)\n' },
    { label: 'the 6th compound of a 64×64 map', text: `space V dim 64\nmap f : V -> V = [${Array.from({ length: 64 }, (_, i) => Array.from({ length: 64 }, (_, j) => (i === j ? 1 : 0)).join(' ')).join('; ')}]\nshow compound(f, 6)\n` },
  ];
  // Every kind of line ending on every sample.
  for (const s of samples) {
    docs.push({ label: `${s.label} with CRLF`, text: s.text.replace(/\n/g, '\r\n') });
    docs.push({ label: `${s.label} with CR`, text: s.text.replace(/\n/g, '\r') });
  }
  return docs;
}
