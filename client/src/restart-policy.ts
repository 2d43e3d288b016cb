/**
 * When the language server's process ends unexpectedly, the client starts it again — but not forever: a
 * server that keeps crashing (a defect met on every start, e.g. on one open document) would otherwise
 * restart in a loop, each time losing the user's results and filling the output. So: at most
 * `MAX_RESTARTS` restarts within `WINDOW_MS`; after that the client stops trying and tells the user, who
 * can start it again with the restart command once the cause is gone.
 *
 * Pure (no VS Code API), so that it is tested on its own; ./extension.ts turns its answers into the
 * language client's close actions.
 */

export const MAX_RESTARTS = 4;
export const WINDOW_MS = 3 * 60_000;

export type RestartDecision = { restart: true; message: string } | { restart: false; message: string };

export class RestartPolicy {
  private readonly crashes: number[] = [];

  constructor(private readonly now: () => number = Date.now) {}

  /** The server's connection closed without the client asking for it. */
  closed(): RestartDecision {
    const at = this.now();
    this.crashes.push(at);
    while (this.crashes.length > 0 && at - this.crashes[0]! > WINDOW_MS) this.crashes.shift();
    const minutes = WINDOW_MS / 60_000;
    if (this.crashes.length > MAX_RESTARTS) {
      return {
        restart: false,
        message:
          `Wedgework: the language server stopped unexpectedly ${this.crashes.length} times in the last ${minutes} minutes ` +
          'and will not be started again. Its output ("Wedgework" in the Output panel) says why; ' +
          'run "Wedgework: Restart Language Server" to try again.',
      };
    }
    return {
      restart: true,
      message: `Wedgework: the language server stopped unexpectedly and was started again (${this.crashes.length} of ${MAX_RESTARTS} restarts allowed within ${minutes} minutes).`,
    };
  }

  /** The user restarted the server by hand: the count starts again. */
  reset(): void {
    this.crashes.length = 0;
  }
}
