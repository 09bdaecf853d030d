const tails = new Map<string, Promise<unknown>>();

/** One holder at a time within this tab, for browsers without the Web Locks API. */
function inTab<T>(name: string, work: () => Promise<T>): Promise<T> {
  const run = (tails.get(name) ?? Promise.resolve()).then(work, work);
  const tail = run.catch(() => undefined);
  tails.set(name, tail);
  void tail.then(() => {
    if (tails.get(name) === tail) tails.delete(name);
  });
  return run;
}

/**
 * Runs `work` while holding the lock `name`: across tabs through navigator.locks where the browser
 * has it (two tabs pushing one outbox would send each change twice), else within this tab.
 */
export function withLock<T>(name: string, work: () => Promise<T>): Promise<T> {
  const locks = typeof navigator !== 'undefined' ? navigator.locks : undefined;
  return locks ? (locks.request(name, work) as Promise<T>) : inTab(name, work);
}
