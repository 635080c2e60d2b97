import { describe, expect, it } from "vitest";
import { createWorkQueue, WorkQueueFullError } from "./work-queue";

/** A job that runs until `finish` is called, recording how many ran at once. */
function controlledJobs() {
  let running = 0;
  let mostAtOnce = 0;
  const finishers: (() => void)[] = [];
  const job = (value: number) => () =>
    new Promise<number>((resolve) => {
      running += 1;
      mostAtOnce = Math.max(mostAtOnce, running);
      finishers.push(() => {
        running -= 1;
        resolve(value);
      });
    });
  return {
    job,
    mostAtOnce: () => mostAtOnce,
    finishOne: () => finishers.shift()?.(),
    started: () => finishers.length,
  };
}

const tick = () => new Promise((resolve) => setTimeout(resolve, 0));

describe("createWorkQueue", () => {
  it("runs no more than `concurrency` jobs at once and the rest in order", async () => {
    const queue = createWorkQueue({ concurrency: 2, maxWaiting: 10 });
    const jobs = controlledJobs();
    const results = [1, 2, 3, 4, 5].map((value) => queue.run(jobs.job(value)));
    await tick();
    expect(jobs.started()).toBe(2);
    expect(queue.load()).toEqual({ running: 2, waiting: 3 });
    while (jobs.started() > 0) {
      jobs.finishOne();
      await tick();
    }
    expect(await Promise.all(results)).toEqual([1, 2, 3, 4, 5]);
    expect(jobs.mostAtOnce()).toBe(2);
    expect(queue.load()).toEqual({ running: 0, waiting: 0 });
  });

  it("refuses a job at once when `maxWaiting` are waiting, and takes jobs again once there is room", async () => {
    const queue = createWorkQueue({ concurrency: 1, maxWaiting: 2 });
    const jobs = controlledJobs();
    const accepted = [1, 2, 3].map((value) => queue.run(jobs.job(value)));
    await expect(queue.run(jobs.job(4))).rejects.toBeInstanceOf(
      WorkQueueFullError,
    );
    jobs.finishOne();
    await tick();
    const later = queue.run(jobs.job(5));
    while (jobs.started() > 0) {
      jobs.finishOne();
      await tick();
    }
    expect(await Promise.all([...accepted, later])).toEqual([1, 2, 3, 5]);
  });

  it("frees the place of a job that fails", async () => {
    const queue = createWorkQueue({ concurrency: 1, maxWaiting: 0 });
    await expect(
      queue.run(() => Promise.reject(new Error("broken"))),
    ).rejects.toThrow("broken");
    expect(await queue.run(() => Promise.resolve("next"))).toBe("next");
  });
});
