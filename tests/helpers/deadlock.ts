// Retries a transaction that lost a deadlock (MariaDB/InnoDB errno 1213 rolls it back whole; a client
// retries it), counting the retries so a concurrency test can report how often it happened.
export function deadlockRetrier(maxRetries: number) {
  const state = { deadlocks: 0 };
  async function retrying<T>(f: () => Promise<T>): Promise<T> {
    for (let i = 0; ; i++) {
      try {
        return await f();
      } catch (err) {
        const code = (err as { cause?: { errno?: number }; errno?: number }).cause?.errno ?? (err as { errno?: number }).errno;
        if (code !== 1213 || i > maxRetries) throw err;
        state.deadlocks++;
      }
    }
  }
  return { retrying, state };
}
