/**
 * SIGINT, SIGTERM and SIGHUP while outputs may be staged: the handlers are installed when the first
 * transaction starts, so that such a signal never stops the process in the middle of one (Node runs
 * a handler only between synchronous steps, and a transaction is one). A handler removes whatever
 * temporary files are remembered, then ends the process by the same signal, as it would have ended.
 */

const SIGNALS = ['SIGINT', 'SIGTERM', 'SIGHUP'] as const;

const cleanups = new Set<() => void>();
let installed = false;

function onSignal(signal: NodeJS.Signals): void {
  for (const cleanup of cleanups) {
    try {
      cleanup();
    } catch {
      // Best effort: the signal ends the process whatever is left.
    }
  }
  cleanups.clear();
  for (const name of SIGNALS) process.removeListener(name, onSignal);
  installed = false;
  process.kill(process.pid, signal);
}

/** Run `cleanup` if a signal comes before forget(cleanup); installs the handlers once. */
export function remember(cleanup: () => void): void {
  cleanups.add(cleanup);
  guardSignals();
}

export function forget(cleanup: () => void): void {
  cleanups.delete(cleanup);
}

/** Install the handlers (once). Kept for the rest of the run: removing one could drop a signal caught meanwhile. */
export function guardSignals(): void {
  if (installed) return;
  installed = true;
  for (const name of SIGNALS) process.on(name, onSignal);
}
