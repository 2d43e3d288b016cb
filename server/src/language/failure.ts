/**
 * How evaluation stops a statement. A `Failure` carries the problem to report;
 * a `Poisoned` failure means an earlier problem already explains it (a name
 * whose declaration failed), so nothing more is reported.
 */
import type { Problem, RelatedSpan, Span } from './types.js';

export class Failure extends Error {
  constructor(readonly problem: Problem) {
    super(problem.message);
    this.name = 'Failure';
  }
}

export class Poisoned extends Error {
  constructor() {
    super('depends on a statement that failed');
    this.name = 'Poisoned';
  }
}

export function fail(code: string, span: Span, message: string, related?: RelatedSpan[]): never {
  throw new Failure({ code, severity: 'error', message, span, ...(related?.length ? { related } : {}) });
}
