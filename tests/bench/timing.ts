/** Timing helpers for benchmarks: best-of-k wall time, so a noisy shared machine bothers less. */
export function bestOfMs(repeats: number, fn: () => void): number {
  let best = Infinity;
  for (let r = 0; r < repeats; r++) {
    const t0 = process.hrtime.bigint();
    fn();
    const ms = Number(process.hrtime.bigint() - t0) / 1e6;
    if (ms < best) best = ms;
  }
  return best;
}

export function row(cells: ReadonlyArray<string | number>, widths: ReadonlyArray<number>): string {
  return cells.map((c, i) => String(c).padStart(widths[i] ?? 10)).join('  ');
}
