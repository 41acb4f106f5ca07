/**
 * Score-over-iterations plot as SVG: one polyline per series (best score, elite mean), linear
 * axes with "nice" tick steps (1, 2 or 5 times a power of ten: P. S. Heckbert, "Nice numbers for
 * graph labels", Graphics Gems, Academic Press 1990, 61–63), and a dashed line at score 0, the
 * border between holding and refuting.
 */
import { formatNumber } from '../invariants/encode.js';
import { xmlEscape } from './svg-graph.js';

export interface PlotSeries {
  readonly label: string;
  readonly colour: string;
  readonly points: ReadonlyArray<readonly [number, number]>;
}

export interface PlotOptions {
  readonly width?: number;
  readonly height?: number;
  readonly title?: string;
  readonly xLabel?: string;
  readonly yLabel?: string;
  /** Ticks on the x axis at whole numbers only (iterations). */
  readonly integerX?: boolean;
}

/** Tick values covering [lo, hi] with about `count` nice steps. */
export function niceTicks(lo: number, hi: number, count = 5, minStep = 0): number[] {
  if (!(hi > lo)) return [lo];
  const raw = (hi - lo) / count;
  const power = Math.pow(10, Math.floor(Math.log10(raw)));
  const fraction = raw / power;
  const step = Math.max(minStep, (fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 5 ? 5 : 10) * power);
  const ticks: number[] = [];
  for (let t = Math.ceil(lo / step - 1e-9) * step; t <= hi + step * 1e-9; t += step)
    ticks.push(Math.abs(t) < step * 1e-9 ? 0 : t);
  return ticks;
}

export function scorePlotSvg(series: ReadonlyArray<PlotSeries>, options: PlotOptions = {}): string {
  const width = options.width ?? 640;
  const height = options.height ?? 320;
  const left = 64;
  const right = 16;
  const top = 32;
  const bottom = 44;
  const finite = series.flatMap((s) => s.points).filter(([x, y]) => Number.isFinite(x) && Number.isFinite(y));
  const xs = finite.map(([x]) => x);
  const ys = finite.map(([, y]) => y);
  const x0 = xs.length ? Math.min(...xs) : 0;
  let x1 = xs.length ? Math.max(...xs) : 1;
  let [y0, y1] = ys.length ? [Math.min(...ys, 0), Math.max(...ys, 0)] : [-1, 1];
  if (x1 === x0) x1 = x0 + 1;
  if (y1 === y0) {
    y0 -= 1;
    y1 += 1;
  }
  const pad = (y1 - y0) * 0.05;
  y0 -= pad;
  y1 += pad;
  const px = (x: number) => Math.round((left + ((x - x0) / (x1 - x0)) * (width - left - right)) * 100) / 100;
  const py = (y: number) => Math.round((top + ((y1 - y) / (y1 - y0)) * (height - top - bottom)) * 100) / 100;
  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" font-family="Helvetica, Arial, sans-serif" font-size="11">`,
  );
  out.push(`<rect width="${width}" height="${height}" fill="#ffffff"/>`);
  if (options.title)
    out.push(`<text x="${left}" y="18" font-size="13" fill="#222222">${xmlEscape(options.title)}</text>`);
  out.push('<g class="axes" stroke="#999999" stroke-width="1">');
  out.push(`<line x1="${left}" y1="${height - bottom}" x2="${width - right}" y2="${height - bottom}"/>`);
  out.push(`<line x1="${left}" y1="${top}" x2="${left}" y2="${height - bottom}"/>`);
  out.push('</g>');
  out.push('<g class="ticks" fill="#444444">');
  for (const t of niceTicks(x0, x1, 6, options.integerX ? 1 : 0)) {
    out.push(`<text x="${px(t)}" y="${height - bottom + 16}" text-anchor="middle">${formatNumber(t)}</text>`);
  }
  for (const t of niceTicks(y0, y1, 5)) {
    out.push(
      `<text x="${left - 6}" y="${py(t) + 4}" text-anchor="end">${formatNumber(Number(t.toPrecision(6)))}</text>`,
    );
    out.push(`<line x1="${left}" y1="${py(t)}" x2="${width - right}" y2="${py(t)}" stroke="#eeeeee"/>`);
  }
  out.push('</g>');
  out.push(
    `<line class="zero" x1="${left}" y1="${py(0)}" x2="${width - right}" y2="${py(0)}" stroke="#c0392b" stroke-dasharray="5,4"/>`,
  );
  for (const s of series) {
    const pts = s.points.filter(([x, y]) => Number.isFinite(x) && Number.isFinite(y));
    if (pts.length === 0) continue;
    const d = pts.map(([x, y]) => `${px(x)},${py(y)}`).join(' ');
    out.push(`<polyline class="series" fill="none" stroke="${s.colour}" stroke-width="1.8" points="${d}"/>`);
  }
  out.push('<g class="legend">');
  series.forEach((s, i) => {
    const x = width - right - 150;
    const y = top + 4 + i * 16;
    out.push(`<line x1="${x}" y1="${y}" x2="${x + 18}" y2="${y}" stroke="${s.colour}" stroke-width="2"/>`);
    out.push(`<text x="${x + 24}" y="${y + 4}" fill="#222222">${xmlEscape(s.label)}</text>`);
  });
  out.push('</g>');
  if (options.xLabel) {
    out.push(
      `<text x="${(left + width - right) / 2}" y="${height - 8}" text-anchor="middle" fill="#444444">${xmlEscape(options.xLabel)}</text>`,
    );
  }
  if (options.yLabel) {
    out.push(
      `<text transform="translate(14 ${(top + height - bottom) / 2}) rotate(-90)" text-anchor="middle" fill="#444444">${xmlEscape(options.yLabel)}</text>`,
    );
  }
  out.push('</svg>');
  return out.join('\n') + '\n';
}
