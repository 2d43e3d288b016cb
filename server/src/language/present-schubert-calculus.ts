/**
 * Presentation of Grassmannians, Schubert classes and the transversals of four lines: summary,
 * hover, LaTeX and JSON, each stating the partition convention (or, for lines, the file's).
 */
import { binomialBig } from '../engine/subsets.js';
import { classDegree, formatClass, grassmannianDimension, SCHUBERT_CLASS_CONVENTION, type SchubertClass } from '../engine/schubert-calculus.js';
import { formatPencilQuadratic } from '../engine/four-line-transversals.js';
import { LINE_COORDINATE_PAIRS } from '../engine/lines-p3.js';
import { subspaceOf } from './arguments.js';
import { conventionJson, conventionSentence } from './conventions.js';
import type { Environment } from './environment.js';
import { presentSubspaceWithPlucker, type Presented } from './present.js';
import { intersectionNumberOf } from './schubert-calculus.js';
import type { ClassValue, GrassmannianValue, TransversalsValue } from './values.js';

function termsJson(c: SchubertClass): { partition: number[]; coefficient: string }[] {
  return c.terms.map((t) => ({ partition: [...t.partition], coefficient: t.coefficient.toString() }));
}

export function presentGrassmannian(X: GrassmannianValue): Presented {
  const dim = grassmannianDimension(X.k, X.n);
  const classes = binomialBig(X.n, X.k);
  return {
    summary: `G(${X.k},${X.n}) · dimension ${dim} · ${classes} Schubert classes`,
    hover: [
      `The Grassmannian G(${X.k},${X.n}) of ${X.k}-dimensional subspaces of a ${X.n}-dimensional space: dimension k(n−k) = ${dim}, ` +
        `with one Schubert class σ_λ for each of the ${classes} partitions λ in the ${X.k}×${X.n - X.k} box.`,
      '',
      SCHUBERT_CLASS_CONVENTION,
    ].join('\n'),
    latex: `G(${X.k},${X.n})`,
    json: { k: X.k, n: X.n, dimension: dim, classes: classes.toString(), convention: SCHUBERT_CLASS_CONVENTION },
  };
}

export function presentClass(v: ClassValue): Presented {
  const c = v.cls;
  const dim = grassmannianDimension(c.k, c.n);
  const degree = classDegree(c);
  const text = formatClass(c);
  const degreeWords =
    c.terms.length === 0 ? 'the zero class' : degree === undefined ? 'a class of mixed degree' : `a class of degree ${degree} (codimension ${degree} of ${dim})`;
  const lines = [`In the cohomology of G(${c.k},${c.n}), ${degreeWords}:`, '', '```text', text, '```'];
  const json: Record<string, unknown> = { grassmannian: `G(${c.k},${c.n})`, terms: termsJson(c) };
  if (degree !== undefined) json.degree = degree;
  if (c.terms.some((t) => t.partition.reduce((a, b) => a + b, 0) === dim)) {
    const number = intersectionNumberOf(c);
    lines.push('', `Its coefficient of the point class σ_{${Array.from({ length: c.k }, () => c.n - c.k).join(',')}}, the intersection number, is ${number}.`);
    json.intersectionNumber = number.toString();
  }
  lines.push('', SCHUBERT_CLASS_CONVENTION);
  json.convention = SCHUBERT_CLASS_CONVENTION;
  return { summary: `${text} in G(${c.k},${c.n})`, hover: lines.join('\n'), latex: formatClass(c, 'latex'), json };
}

export function presentTransversals(env: Environment, v: TransversalsValue): Presented {
  const r = v.result;
  const F = env.F;
  const space = v.lines[0]!.space;
  const lines = ['The lines of projective 3-space that meet the four given lines.', '', r.summary];
  const json: Record<string, unknown> = { kind: r.kind, predictedCount: r.predictedCount.toString(), pluckerRank: r.pluckerRank };
  let summary = r.summary.replace(/\s*\(the Schubert calculus predicts[^)]*\)/, '');
  let latex = '';
  if (r.meetingPairs.length > 0) {
    lines.push('', `Given lines that meet: ${r.meetingPairs.map(([i, j]) => `${i + 1} and ${j + 1}`).join(', ')}.`);
    json.meetingPairs = r.meetingPairs.map(([i, j]) => [i + 1, j + 1]);
  }
  if (r.kind === 'finite') {
    json.quadratic = formatPencilQuadratic(F, r.quadratic);
    json.discriminant = F.format(r.discriminant);
    json.distinctOverClosure = r.distinctOverClosure;
    json.rootsInField = r.rootsInField;
    if (r.realCount !== undefined) json.realCount = r.realCount;
    // The pencil's vectors, labelled in lexicographic order (the engine's order of line coordinates).
    const labels = LINE_COORDINATE_PAIRS.map((pair) => env.labels.name([...pair], 4));
    const vector = (x: readonly unknown[]) => `(${x.map((c) => F.format(c)).join(', ')})`;
    lines.push(
      '',
      `On the pencil s·u + t·v of 6-vectors Klein-orthogonal to all four lines, with u = ${vector(r.pencil[0])} and ` +
        `v = ${vector(r.pencil[1])} (coordinates ${labels.join(', ')}), the Klein quadric is ${formatPencilQuadratic(F, r.quadratic)} = 0, ` +
        `with discriminant ${F.format(r.discriminant)}.`,
    );
    json.pencil = r.pencil.map((x) => x.map((c) => F.format(c)));
    const found = r.transversals.map((t) => presentSubspaceWithPlucker(env, subspaceOf(env, space, t.basis)));
    json.transversals = r.transversals.map((t, i) => ({ basis: t.basis.map((row) => row.map((x) => F.format(x))), multiplicity: t.multiplicity, plucker: found[i]!.json.plucker }));
    found.forEach((p, i) => lines.push('', `**Transversal ${i + 1}**${r.transversals[i]!.multiplicity === 2 ? ' (double)' : ''}: ${p.summary}`));
    latex = found.length > 0 ? found.map((p) => p.latex).join(',\\quad ') : `${formatPencilQuadratic(F, r.quadratic).replace(/·/g, '\\,').replace(/²/g, '^{2}')} = 0`;
    if (found.length > 0) summary = `${found.length} transversal${found.length === 1 ? '' : 's'} over ${F.name}: ${found.map((p) => p.summary.split(' · ').find((x) => x.startsWith('[')) ?? '').join(', ')}`;
  } else {
    latex = `\\text{${r.kind === 'whole-pencil' ? 'a pencil of transversals' : 'a family of transversals'}}`;
  }
  lines.push('', `The Schubert calculus predicts σ_1^4 = ${r.predictedCount} in G(2,4) for four general lines, counted with multiplicity over an algebraically closed field.`);
  lines.push('', conventionSentence(env.convention));
  json.convention = conventionJson(env.convention);
  return { summary, hover: lines.join('\n'), latex, json };
}
