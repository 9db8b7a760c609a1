/** Runs the latest call of each key once `ms` have passed without another call for that key. */
export interface KeyedDebounce {
  schedule(key: string, run: () => void): void;
  cancel(key: string): void;
}

/** A debounce per key (one per open document), so typing in one document never delays another. */
export function createKeyedDebounce(ms: number): KeyedDebounce {
  const timers = new Map<string, NodeJS.Timeout>();
  const cancel = (key: string) => {
    const timer = timers.get(key);
    if (timer !== undefined) clearTimeout(timer);
    timers.delete(key);
  };
  return {
    schedule(key, run) {
      cancel(key);
      timers.set(key, setTimeout(() => {
        timers.delete(key);
        run();
      }, ms));
    },
    cancel,
  };
}
