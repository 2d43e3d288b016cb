/**
 * Thrown by `analyze` when the caller's `shouldStop` asks it to stop between two statements (the server
 * stops an evaluation this way when a newer version of the document arrives, so that the evaluation thread
 * and what it remembers survive). It is the one exception `analyze` lets through.
 */
export class EvaluationStopped extends Error {
  constructor() {
    super('the evaluation was stopped before its end');
    this.name = 'EvaluationStopped';
  }
}
