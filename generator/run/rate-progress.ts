// Progress of a long count of steps as stderr lines: what, how far, the rate and the time left, at
// most every intervalMs (and always on the last step), so that a log file stays readable.

export interface RateProgress {
  step(done: number, detail?: string): void;
}

export function createRateProgress(what: string, total: number, log: (line: string) => void, intervalMs = 5_000): RateProgress {
  const startMs = Date.now();
  let lastMs = startMs;
  return {
    step(done, detail) {
      const now = Date.now();
      if (done < total && now - lastMs < intervalMs) return;
      lastMs = now;
      const seconds = (now - startMs) / 1000;
      const rate = seconds > 0 ? done / seconds : 0;
      const eta = rate > 0 ? `, ${Math.ceil((total - done) / rate)} s left` : '';
      log(`${what}: ${done}/${total} (${(100 * done / Math.max(total, 1)).toFixed(0)}%), ${rate.toFixed(2)}/s${eta}${detail ? ` — ${detail}` : ''}`);
    },
  };
}
