/**
 * A bound on expensive work (password hashing): at most `concurrency` jobs
 * run at once, at most `maxWaiting` more wait their turn, and a job beyond
 * that is refused at once with `WorkQueueFullError` instead of piling up.
 */
export class WorkQueueFullError extends Error {
  constructor() {
    super("Too much of this work is waiting already.");
    this.name = "WorkQueueFullError";
  }
}

export interface WorkQueue {
  run<T>(job: () => Promise<T>): Promise<T>;
  /** Jobs running now and jobs waiting. */
  load(): { running: number; waiting: number };
}

export function createWorkQueue(options: {
  concurrency: number;
  maxWaiting: number;
}): WorkQueue {
  let running = 0;
  const waiting: (() => void)[] = [];

  function finished() {
    const next = waiting.shift();
    if (next) next();
    else running -= 1;
  }

  return {
    async run<T>(job: () => Promise<T>): Promise<T> {
      if (running < options.concurrency) {
        running += 1;
      } else if (waiting.length < options.maxWaiting) {
        // The finishing job hands its place over: `running` stays the same.
        await new Promise<void>((resolve) => waiting.push(resolve));
      } else {
        throw new WorkQueueFullError();
      }
      try {
        return await job();
      } finally {
        finished();
      }
    },
    load: () => ({ running, waiting: waiting.length }),
  };
}
