import { describe, expect, it } from 'vitest';
import { createInFlightWork } from './in-flight-work';

/** A promise the test resolves or rejects by hand. */
function gate<T = void>() {
  let open!: (value: T) => void;
  let fail!: (error: unknown) => void;
  const promise = new Promise<T>((resolve, reject) => {
    open = resolve;
    fail = reject;
  });
  return { promise, open, fail };
}

/** Whether `promise` has settled once pending callbacks have run. */
async function hasSettled(promise: Promise<unknown>): Promise<boolean> {
  let settled = false;
  promise.then(
    () => (settled = true),
    () => (settled = true),
  );
  await new Promise((resolve) => setImmediate(resolve));
  return settled;
}

describe('createInFlightWork', () => {
  it('is settled at once when nothing runs', async () => {
    const work = createInFlightWork();
    expect(work.count()).toBe(0);
    expect(await hasSettled(work.settled())).toBe(true);
  });

  it('counts work from the moment run is called until it settles, and passes its result through', async () => {
    const work = createInFlightWork();
    const first = gate<string>();
    const second = gate<number>();
    const a = work.run(() => first.promise);
    const b = work.run(() => second.promise);
    expect(work.count()).toBe(2);

    first.open('done');
    expect(await a).toBe('done');
    expect(work.count()).toBe(1);

    second.open(42);
    expect(await b).toBe(42);
    expect(work.count()).toBe(0);
  });

  it('settled() waits for every piece of work running, not just the first to finish', async () => {
    const work = createInFlightWork();
    const first = gate();
    const second = gate();
    void work.run(() => first.promise);
    void work.run(() => second.promise);
    const settled = work.settled();

    first.open();
    expect(await hasSettled(settled)).toBe(false);
    second.open();
    expect(await hasSettled(settled)).toBe(true);
  });

  it('stops counting work that fails, and hands its error back to the caller', async () => {
    const work = createInFlightWork();
    const failing = gate();
    const run = work.run(() => failing.promise);
    const settled = work.settled();
    failing.fail(new Error('Cannot reach the database'));
    await expect(run).rejects.toThrow('Cannot reach the database');
    expect(work.count()).toBe(0);
    expect(await hasSettled(settled)).toBe(true);
  });

  it('stops counting work that throws before its first await', async () => {
    const work = createInFlightWork();
    await expect(
      work.run(() => {
        throw new Error('bad input');
      }),
    ).rejects.toThrow('bad input');
    expect(work.count()).toBe(0);
  });

  it('a later settled() waits for work started after an earlier one resolved', async () => {
    const work = createInFlightWork();
    const first = gate();
    void work.run(() => first.promise);
    const earlier = work.settled();
    first.open();
    await earlier;

    const second = gate();
    void work.run(() => second.promise);
    const later = work.settled();
    expect(await hasSettled(later)).toBe(false);
    second.open();
    expect(await hasSettled(later)).toBe(true);
  });
});
