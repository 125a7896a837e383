/**
 * Where routes find the running job queue. startServer registers the queue it started (and
 * unregisters it on close); an app without a queue (JOBS_ENABLED=false, or createApp alone in tests)
 * stores large spreads as 'queued', and the next worker that starts picks them up.
 */
export interface SpreadQueue {
  enqueue(spreadId: string): Promise<void>;
}

let current: SpreadQueue | null = null;

export function registerSpreadQueue(queue: SpreadQueue | null): void {
  current = queue;
}

export function spreadQueue(): SpreadQueue | null {
  return current;
}
