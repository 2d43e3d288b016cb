/**
 * Generated .wedge documents of a given length for the server benchmark: a
 * header, then blocks of ten lines, each with a plane of a 6-space, its
 * Plücker vector, claims about both and a show. Every name is unique, and the
 * entries vary so that no two blocks compute the same thing.
 */

export interface GeneratedDocument {
  text: string;
  /** The line and character of an edit point (inside a vector's last coordinate) in the middle of the document. */
  editLine: number;
  editCharacter: number;
  /** Positions on names (line, character), spread over the document, to hover on. */
  hovers: { line: number; character: number }[];
}

const HEADER = ['# A generated document for the server benchmark.', 'field QQ', 'normalize primitive', 'space V dim 6', ''];

function block(i: number): string[] {
  const a = (i % 7) - 3;
  const b = (i % 5) + 1;
  const c = (i % 11) - 5;
  return [
    `# Block ${i}.`,
    `vector u${i} = (1, ${a}, 0, ${b}, 0, ${c})`,
    `vector v${i} = (0, 1, ${b}, 0, ${a}, 1)`,
    `subspace W${i} = span(u${i}, v${i})`,
    `multivector w${i} = plucker(W${i})`,
    `claim dim W${i} = 2`,
    `claim w${i} decomposable`,
    `claim u${i} in W${i}`,
    `show plucker(W${i})`,
    '',
  ];
}

/** A document of about `lines` lines (the header plus whole blocks). */
export function generateDocument(lines: number): GeneratedDocument {
  const blocks = Math.max(1, Math.round((lines - HEADER.length) / 10));
  const all = [...HEADER];
  const hovers: { line: number; character: number }[] = [];
  const middle = Math.floor(blocks / 2);
  let editLine = 0;
  let editCharacter = 0;
  for (let i = 0; i < blocks; i++) {
    const start = all.length;
    const b = block(i);
    all.push(...b);
    // Hover on the name after `show plucker(`.
    hovers.push({ line: start + 8, character: 'show plucker('.length + 1 });
    if (i === middle) {
      editLine = start + 1;
      // Just before the closing parenthesis of u's coordinates.
      editCharacter = b[1]!.length - 1;
    }
  }
  return { text: all.join('\n') + '\n', editLine, editCharacter, hovers };
}
