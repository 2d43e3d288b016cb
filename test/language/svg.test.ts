/**
 * The pictures in hovers: every SVG is well-formed XML (checked by our small
 * checker, itself tested on broken input first), carries the exact entries
 * it shows, stays under the size bound, and appears in a hover only for sizes
 * where it is legible. Expected entries and signs come from mathjs (an
 * independent library) or from facts named beside each check.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { create, all } from 'mathjs';
import { analyze, hoverAt, type Analysis } from '../../server/src/language/index.js';
import { byteLength, MAX_SVG_BYTES, svgImageMarkdown } from '../../server/src/language/svg/document.js';
import { matrixSvg } from '../../server/src/language/svg/matrix.js';
import { signPatternSvg, SIGN_PATTERN_LIMIT, type Mark } from '../../server/src/language/svg/sign-pattern.js';
import { youngDiagramSvg } from '../../server/src/language/svg/young-diagram.js';
import { allElements, parseWellFormedXml, type XmlElement } from './xml-well-formed.js';

const math = create(all, { number: 'Fraction' });

/** The texts of the <text> elements under the group of class `cls`, in document order. */
function textsIn(root: XmlElement, cls: string): string[] {
  const group = allElements(root).find((e) => e.name === 'g' && e.attributes['class'] === cls);
  return group ? group.children.filter((c) => c.name === 'text').map((c) => c.text) : [];
}

function pathOf(root: XmlElement, cls: string): string | undefined {
  return allElements(root).find((e) => e.name === 'path' && e.attributes['class'] === cls)?.attributes['d'];
}

/** The images of a hover: alt text and the decoded SVG. */
function hoverImages(markdown: string): { alt: string; svg: string }[] {
  return [...markdown.matchAll(/!\[((?:\\.|[^\\\]])*)\]\(data:image\/svg\+xml;base64,([A-Za-z0-9+/=]+)\)/g)].map((m) => ({
    alt: m[1]!,
    svg: new TextDecoder().decode(Uint8Array.from(atob(m[2]!), (c) => c.charCodeAt(0))),
  }));
}

function hoverOf(text: string, at: string, index = 0): string {
  const a: Analysis = analyze(text, { evaluate: true });
  assert.deepEqual(a.problems.map((p) => p.message), []);
  const hover = hoverAt(a, text.indexOf(at) + index);
  assert.ok(hover, `a hover at ${at}`);
  return hover.markdown;
}

describe('the well-formedness checker', () => {
  test('accepts a small document and rejects the usual breakages', () => {
    const ok = parseWellFormedXml('<svg a="1"><g><text x=\'2\'>1 &lt; 2 &amp; &#955;</text></g><rect/></svg>');
    assert.equal(allElements(ok).find((e) => e.name === 'text')!.text, '1 < 2 & λ');
    for (const bad of [
      '<svg><g></svg>',
      '<svg><g></g>',
      '<svg a=1></svg>',
      '<svg a="1" a="2"></svg>',
      '<svg>&nbsp;</svg>',
      '<svg>a & b</svg>',
      '<svg></svg><svg></svg>',
      'text<svg></svg>',
      '<svg><text>1 < 2</text></svg>',
    ]) {
      assert.throws(() => parseWellFormedXml(bad), Error, bad);
    }
  });
});

describe('matrix pictures', () => {
  test('a bracketed grid of the exact entries, row by row, well-formed and small', () => {
    const cells = [['1', '0', '-1/2'], ['0', '1', '7/3']];
    const svg = matrixSvg({ cells, title: 'Reduced basis' })!;
    const root = parseWellFormedXml(svg);
    assert.equal(root.name, 'svg');
    assert.equal(allElements(root).find((e) => e.name === 'title')!.text, 'Reduced basis');
    assert.deepEqual(textsIn(root, 'e'), cells.flat());
    assert.ok(pathOf(root, 'b'), 'the brackets');
    assert.ok(byteLength(svg) < MAX_SVG_BYTES);
  });

  test('the largest legible matrix, 8×16 with 12-character entries, stays under 8 KB', () => {
    const cells = Array.from({ length: 8 }, (_, i) => Array.from({ length: 16 }, (_, j) => `-${i}${j}/12345678`.slice(0, 12)));
    const svg = matrixSvg({ cells, title: 'big', columnLabels: cells[0]!.map((_, j) => String(j + 1)), shadedColumns: new Set([0, 3]) });
    assert.ok(svg, 'an image');
    assert.ok(byteLength(svg) <= MAX_SVG_BYTES, `${byteLength(svg)} bytes`);
    const root = parseWellFormedXml(svg);
    assert.deepEqual(textsIn(root, 'e'), cells.flat());
    assert.deepEqual(textsIn(root, 'h'), cells[0]!.map((_, j) => String(j + 1)));
    assert.equal((pathOf(root, 's') ?? '').match(/M/g)?.length, 2, 'two shaded columns');
  });

  test('past the legible sizes there is no picture', () => {
    const grid = (r: number, c: number, x = '1') => Array.from({ length: r }, () => Array.from({ length: c }, () => x));
    assert.ok(matrixSvg({ cells: grid(16, 8), title: 't' }), 'tall matrices up to 16×8 are drawn');
    assert.equal(matrixSvg({ cells: grid(9, 9), title: 't' }), undefined);
    assert.equal(matrixSvg({ cells: grid(2, 17), title: 't' }), undefined);
    assert.equal(matrixSvg({ cells: grid(2, 2, '1234567890123'), title: 't' }), undefined);
    assert.equal(matrixSvg({ cells: [], title: 't' }), undefined);
  });

  test('entries and titles are escaped as XML', () => {
    const svg = matrixSvg({ cells: [['<1>', '&']], title: 'a "quoted" <title>' })!;
    const root = parseWellFormedXml(svg);
    assert.deepEqual(textsIn(root, 'e'), ['<1>', '&']);
    assert.equal(root.attributes['aria-label'], 'a "quoted" <title>');
  });
});

describe('Young diagrams', () => {
  /** The number of boxes the filled path covers: each row is one rectangle `h<width>` of 16-pixel boxes. */
  function filledBoxes(svg: string): number {
    const d = pathOf(parseWellFormedXml(svg), 'f') ?? '';
    return [...d.matchAll(/h(\d+)v/g)].reduce((sum, m) => sum + Number(m[1]) / 16, 0);
  }

  test('every partition in the 3×3 box: well-formed, |λ| filled boxes; there are C(6,3) = 20 of them', () => {
    // The partitions in a k×m box are counted by C(k+m, k) (Stanley, "Enumerative Combinatorics I", §1.7, from memory).
    let count = 0;
    for (let a = 0; a <= 3; a++) {
      for (let b = 0; b <= a; b++) {
        for (let c = 0; c <= b; c++) {
          const svg = youngDiagramSvg([a, b, c], 3, 3);
          assert.ok(svg);
          parseWellFormedXml(svg);
          assert.equal(filledBoxes(svg), a + b + c);
          assert.ok(byteLength(svg) < MAX_SVG_BYTES);
          count++;
        }
      }
    }
    assert.equal(count, 20);
  });

  test('the caption names λ; a partition outside its box, or a box past the legible size, has no picture', () => {
    const root = parseWellFormedXml(youngDiagramSvg([2, 1], 2, 3)!);
    assert.ok(allElements(root).some((e) => e.name === 'text' && e.text === 'λ = (2, 1)'));
    assert.equal(youngDiagramSvg([4, 1], 2, 3), undefined);
    assert.equal(youngDiagramSvg([1, 2], 2, 3), undefined, 'parts must not increase');
    assert.equal(youngDiagramSvg([0], 17, 3), undefined);
    assert.ok(byteLength(youngDiagramSvg([32, 16, 8], 16, 32)!) < MAX_SVG_BYTES);
  });
});

describe('sign patterns', () => {
  const SYMBOLS: Record<Mark, string> = { '+': '+', '-': '−', '0': '0', nonzero: '•' };
  const CLASSES: Record<Mark, string> = { '+': 'p', '-': 'm', '0': 'z', nonzero: 'n' };

  test('one labelled cell per coordinate; + − 0 differ by symbol and by fill class', () => {
    const labels = ['12', '13', '14', '23', '24', '34'];
    const marks: Mark[] = ['+', '+', '0', '-', '0', '+'];
    const root = parseWellFormedXml(signPatternSvg(labels, marks, 'pattern')!);
    assert.deepEqual(textsIn(root, 'l'), labels);
    for (const mark of ['+', '-', '0'] as const) {
      const count = marks.filter((m) => m === mark).length;
      assert.deepEqual(textsIn(root, `${CLASSES[mark]}t`), new Array(count).fill(SYMBOLS[mark]), `symbols ${mark}`);
      assert.equal(pathOf(root, CLASSES[mark])!.match(/M/g)!.length, count, `cells ${mark}`);
    }
    // The fills are told apart without colour: solid, hatched (a pattern), dashed outline.
    const style = allElements(root).find((e) => e.name === 'style')!.text;
    assert.match(style, /\.m\{fill:url\(#h\)/);
    assert.match(style, /\.z\{[^}]*stroke-dasharray/);
  });

  test('up to 70 coordinates: C(8,4) = 70 fits under 8 KB, C(9,4) = 126 gets no picture', () => {
    const labels: string[] = [];
    for (let a = 1; a <= 8; a++) for (let b = a + 1; b <= 8; b++) for (let c = b + 1; c <= 8; c++) for (let d = c + 1; d <= 8; d++) labels.push(`${a}${b}${c}${d}`);
    assert.equal(labels.length, SIGN_PATTERN_LIMIT);
    const marks = labels.map((_, i): Mark => (['+', '-', '0'] as const)[i % 3]!);
    const svg = signPatternSvg(labels, marks, 'seventy')!;
    assert.ok(byteLength(svg) <= MAX_SVG_BYTES, `${byteLength(svg)} bytes`);
    assert.deepEqual(textsIn(parseWellFormedXml(svg), 'l'), labels);
    assert.equal(signPatternSvg([...labels, '9999'], [...marks, '+'], 'too many'), undefined);
  });
});

describe('images in hovers', () => {
  test('a subspace of QQ^4: its sign pattern (signs of the mathjs minors) and its reduced basis', () => {
    const rows = [[1, 0, 2, -1], [0, 1, 3, 5]];
    const text = 'space V dim 4\nsubspace W = rows [ 1 0 2 -1\n                    0 1 3 5 ]\n';
    const images = hoverImages(hoverOf(text, 'W =')).map((i) => ({ ...i, root: parseWellFormedXml(i.svg) }));
    assert.equal(images.length, 2);
    for (const image of images) assert.ok(byteLength(image.svg) <= MAX_SVG_BYTES);
    const [pattern, basis] = images;
    // Signs of the 2×2 minors by mathjs; the primitive point keeps them, its first coordinate p12 = 1 being positive.
    const signs: string[] = [];
    for (let i = 0; i < 4; i++) {
      for (let j = i + 1; j < 4; j++) {
        const d = Number(math.det(math.matrix([[rows[0]![i]!, rows[0]![j]!], [rows[1]![i]!, rows[1]![j]!]])));
        signs.push(d > 0 ? '+' : d < 0 ? '−' : '0');
      }
    }
    const shown = textsIn(pattern!.root, 'l').map((label, i) => [label, i] as const);
    assert.deepEqual(shown.map(([l]) => l), ['12', '13', '14', '23', '24', '34']);
    const symbols = ['pt', 'mt', 'zt'].flatMap((cls) => textsIn(pattern!.root, cls));
    assert.deepEqual(symbols.sort(), [...signs].sort());
    assert.match(pattern!.alt, /12 \+, 13 \+, 14 \+, 23 −, 24 \+, 34 \+/);
    // The reduced basis of a basis already in echelon form is itself.
    assert.deepEqual(textsIn(basis!.root, 'e'), rows.flat().map(String));
    assert.match(basis!.alt, /Reduced basis, a 2×4 matrix with rows 1 0 2 -1; 0 1 3 5/);
  });

  test('a chart: [I | Y] with the identity columns 2 and 4 shaded (Y = A_I⁻¹·A by mathjs)', () => {
    const A = [[1, 2, 0, 1], [1, 3, 1, 2]];
    const text = 'space V dim 4\nsubspace W = rows [1 2 0 1; 1 3 1 2]\nshow chart(W, 24)\n';
    const images = hoverImages(hoverOf(text, 'show chart'));
    const chart = images.find((i) => /Chart basis/.test(i.alt));
    assert.ok(chart);
    const root = parseWellFormedXml(chart.svg);
    const inverse = math.inv(math.matrix([[A[0]![1]!, A[0]![3]!], [A[1]![1]!, A[1]![3]!]].map((r) => r.map((x) => math.fraction(x)))));
    const full = math.multiply(inverse, math.matrix(A.map((r) => r.map((x) => math.fraction(x))))) as unknown as { toArray(): unknown[][] };
    const expected = full.toArray().flat().map((x) => math.format(x as never, { fraction: 'ratio' }).replace(/\/1$/, ''));
    assert.deepEqual(textsIn(root, 'e'), expected);
    assert.deepEqual(textsIn(root, 'h'), ['1', '2', '3', '4']);
    assert.equal(pathOf(root, 's')!.match(/M/g)!.length, 2);
  });

  test('a Schubert cell: the Young diagram of λ = (2, 1) for span(e2, e4) in G(2,5) (λ_j = n − k + j − i_j)', () => {
    const text = 'space V dim 5\nshow schubert(span(e2, e4))\n';
    const [young] = hoverImages(hoverOf(text, 'show'));
    assert.ok(young);
    assert.match(young.alt, /λ = \(2, 1\) in the 2×3 box \(3 boxes\)/);
    parseWellFormedXml(young.svg);
  });

  test('over GF(5) the pattern is of zeros and nonzeros, which have no sign', () => {
    const text = 'field GF(5)\nspace V dim 3\nsubspace W = span((1, 0, 2), (0, 1, 0))\n';
    const images = hoverImages(hoverOf(text, 'W ='));
    const pattern = images.find((i) => /Zero pattern/.test(i.alt));
    assert.ok(pattern);
    const root = parseWellFormedXml(pattern.svg);
    // Minors of the rows (1, 0, 2), (0, 1, 0) by hand: p12 = det [[1, 0], [0, 1]] = 1, p13 = det [[1, 2], [0, 0]] = 0,
    // p23 = det [[0, 2], [1, 0]] = −2 = 3 (mod 5): nonzero, zero, nonzero.
    assert.deepEqual(textsIn(root, 'l'), ['12', '13', '23']);
    assert.deepEqual(textsIn(root, 'nt'), ['•', '•']);
    assert.deepEqual(textsIn(root, 'zt'), ['0']);
  });

  test('past the legible sizes a hover has its text alone', () => {
    // G(2,17): a 2×17 basis (wider than 16) and C(17,2) = 136 coordinates (more than 70).
    const row1 = Array.from({ length: 17 }, (_, i) => (i === 0 ? 1 : 0)).join(' ');
    const row2 = Array.from({ length: 17 }, (_, i) => (i === 1 ? 1 : i)).join(' ');
    const text = `space V dim 17\nsubspace W = rows [${row1}; ${row2}]\n`;
    const markdown = hoverOf(text, 'W =');
    assert.deepEqual(hoverImages(markdown), []);
    assert.match(markdown, /Reduced basis/);
  });

  test('the markdown image escapes brackets in its alt text', () => {
    const line = svgImageMarkdown('a [b] c\nd', '<svg xmlns="http://www.w3.org/2000/svg"/>');
    assert.match(line, /^!\[a \\\[b\\\] c d\]\(data:image\/svg\+xml;base64,[A-Za-z0-9+/=]+\)$/);
  });
});
