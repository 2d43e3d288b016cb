/**
 * Process groups started by the editor tests, and the guarantee that they are stopped.
 *
 * Each tool is started as the leader of its own process group (spawn with `detached: true`, which
 * calls setsid), so one signal to the group also reaches its children: code-server's extension host
 * and the language server it starts would otherwise outlive the main process for seconds.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { appendFileSync, existsSync, readFileSync, rmSync } from 'node:fs';

/**
 * When set (by scripts/e2e/run.ts), every group leader is also noted in this file, so that the runner
 * can stop what a stage left behind even if the stage itself was killed before it could clean up.
 */
export const GROUP_FILE_VARIABLE = 'WEDGEWORK_E2E_GROUP_FILE';

/** Leaders of the groups still running. */
const groups = new Set<number>();

function signalGroup(pid: number, signal: NodeJS.Signals | 0): boolean {
  try {
    process.kill(-pid, signal);
    return true;
  } catch {
    return false; // ESRCH: the whole group is gone.
  }
}

const groupAlive = (pid: number) => signalGroup(pid, 0);
const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

export interface GroupOptions {
  env: NodeJS.ProcessEnv;
  cwd?: string;
  onOutput?: (chunk: Buffer) => void;
}

/** Starts `command` as a new process group; its stdout and stderr go to `onOutput`. */
export function spawnGroup(command: string, args: string[], { env, cwd, onOutput }: GroupOptions): ChildProcess & { pid: number } {
  const child = spawn(command, args, { env, cwd, detached: true, stdio: ['ignore', 'pipe', 'pipe'] });
  if (child.pid === undefined) throw new Error(`could not start ${command}`);
  groups.add(child.pid);
  const groupFile = process.env[GROUP_FILE_VARIABLE];
  if (groupFile) appendFileSync(groupFile, `${child.pid}\n`);
  child.stdout!.on('data', (chunk: Buffer) => onOutput?.(chunk));
  child.stderr!.on('data', (chunk: Buffer) => onOutput?.(chunk));
  return child as ChildProcess & { pid: number };
}

/**
 * Stops a group: SIGTERM to every member, then SIGKILL to whatever is left after `graceMs`.
 * Resolves once no member of the group is left (or only dead ones that are not reaped yet).
 */
export async function stopGroup(pid: number, graceMs = 3000): Promise<void> {
  if (!groups.has(pid)) return;
  signalGroup(pid, 'SIGTERM');
  const deadline = Date.now() + graceMs;
  while (groupAlive(pid) && Date.now() < deadline) await pause(50);
  if (groupAlive(pid)) signalGroup(pid, 'SIGKILL');
  // SIGKILL cannot be ignored; what can stay visible a little longer are dead members not yet reaped.
  const killDeadline = Date.now() + 2000;
  while (groupAlive(pid) && Date.now() < killDeadline) await pause(20);
  groups.delete(pid);
}

/** Kills every group noted in `groupFile` that is still running, then removes the file; returns how many. */
export function killNotedGroups(groupFile: string): number {
  if (!existsSync(groupFile)) return 0;
  let killed = 0;
  for (const line of readFileSync(groupFile, 'utf8').split('\n')) {
    const pid = Number(line);
    if (Number.isInteger(pid) && pid > 1 && groupAlive(pid) && signalGroup(pid, 'SIGKILL')) killed++;
  }
  rmSync(groupFile, { force: true });
  return killed;
}

/** Last resort when the test process itself ends: no group may outlive it. */
function killAllNow(): void {
  for (const pid of groups) signalGroup(pid, 'SIGKILL');
  groups.clear();
}

process.on('exit', killAllNow);
const SIGNAL_NUMBERS = { SIGINT: 2, SIGTERM: 15, SIGHUP: 1 } as const;
for (const signal of Object.keys(SIGNAL_NUMBERS) as (keyof typeof SIGNAL_NUMBERS)[]) {
  process.once(signal, () => {
    killAllNow();
    process.exit(128 + SIGNAL_NUMBERS[signal]);
  });
}
