/**
 * report.html: one self-contained page (inline CSS and SVG, no external resources, so it opens
 * offline and can be mailed) showing what a run found and how to reproduce it: the conjecture,
 * options and seed, the score plot, every counterexample with its certificate, the best graphs,
 * near misses at other orders, and the commands that rerun, resume and re-certify.
 */
import { decodeGraph6 } from '../graph/graph6.js';
import { graphToSvg, xmlEscape } from './svg-graph.js';
import { scorePlotSvg } from './svg-plot.js';
import { type RunFiles, type RunScorePoint, type RunSummaryGraph } from './run-files.js';

export interface ReportInput {
  readonly run: RunFiles;
  readonly series: ReadonlyArray<RunScorePoint>;
  /** The conjecture's statement, when its file could be read and is unchanged. */
  readonly statement: string | null;
  /** Why the statement is missing, if it is. */
  readonly statementNote?: string;
  /** How many of the best graphs to draw. */
  readonly top?: number;
}

const CSS = `
body { font-family: Helvetica, Arial, sans-serif; margin: 2em auto; max-width: 1100px; color: #222; line-height: 1.45; padding: 0 1em; }
h1 { font-size: 1.5em; margin-bottom: 0.2em; } h2 { font-size: 1.15em; margin-top: 2em; border-bottom: 1px solid #ddd; }
.statement { font-size: 1.1em; background: #f6f6f2; padding: 0.6em 1em; border-left: 4px solid #3b528b; }
table { border-collapse: collapse; } td, th { padding: 2px 12px 2px 0; text-align: left; vertical-align: top; }
code, pre { font-family: Menlo, Consolas, monospace; font-size: 0.92em; }
pre { background: #f4f4f4; padding: 0.7em 1em; overflow-x: auto; }
.grid { display: flex; flex-wrap: wrap; gap: 1em; } .card { border: 1px solid #ddd; padding: 0.5em; }
.card p { margin: 0.3em 0; font-size: 0.9em; max-width: 360px; word-break: break-all; }
.verdict-certified { color: #1a7f37; font-weight: bold; } .verdict-other { color: #9a6700; font-weight: bold; }
.muted { color: #666; }
`;

function esc(x: unknown): string {
  return xmlEscape(String(x));
}

function shellQuote(s: string): string {
  return /^[A-Za-z0-9_./:=,@+-]+$/.test(s) ? s : `'${s.replace(/'/g, `'\\''`)}'`;
}

function certificationOf(rec: RunSummaryGraph): string {
  const c = rec.certification;
  if (typeof c === 'string') return c;
  if (c && typeof c === 'object' && typeof (c as { verdict?: unknown }).verdict === 'string')
    return (c as { verdict: string }).verdict;
  return 'not recorded';
}

function card(rec: RunSummaryGraph, index: number, withCertificate: boolean): string {
  let svg: string;
  try {
    svg = graphToSvg(decodeGraph6(rec.graph6), { size: 300, caption: [`score ${rec.score}`] });
  } catch {
    svg = `<p class="muted">cannot draw ${esc(rec.graph6)}</p>`;
  }
  const cert = certificationOf(rec);
  const lines = [`<div class="card" id="graph-${index}">`, svg.replace(/^<svg /, '<svg role="img" ')];
  lines.push(`<p><code>${esc(rec.graph6)}</code></p><p>score ${esc(rec.score)}</p>`);
  if (withCertificate) {
    const cls = /^certified/.test(cert) ? 'verdict-certified' : 'verdict-other';
    lines.push(`<p>certification: <span class="${cls}">${esc(cert)}</span></p>`);
    const certificate =
      rec.certificate ?? (typeof rec.certification === 'object' ? rec.certification : undefined);
    if (certificate !== undefined)
      lines.push(
        `<details><summary>certificate</summary><pre>${esc(JSON.stringify(certificate, null, 2))}</pre></details>`,
      );
  }
  lines.push('</div>');
  return lines.join('\n');
}

/** The reproduce commands, from the manifest's recorded options. */
export function reproduceCommands(run: RunFiles): string[] {
  const m = run.manifest as {
    conjecture?: { path?: string; name?: string };
    options?: Record<string, unknown>;
  };
  const file = m.conjecture?.path ?? 'CONJECTURE.ts';
  const o = m.options ?? {};
  const flag: Record<string, string> = {
    vertices: '--vertices',
    seed: '--seed',
    batch: '--batch',
    elite: '--elite',
    keep: '--keep',
    layers: '--layers',
    learningRate: '--learning-rate',
    trainGraphs: '--train-graphs',
  };
  const parts = ['refute', 'hunt', shellQuote(file)];
  if (m.conjecture?.name) parts.push('--conjecture', shellQuote(m.conjecture.name));
  for (const [key, name] of Object.entries(flag)) {
    const v = o[key];
    if (v === undefined) continue;
    parts.push(name, shellQuote(Array.isArray(v) ? v.join(',') : String(v)));
  }
  if (o.explore === false) parts.push('--plain');
  parts.push('--out', shellQuote(`${run.dir}-rerun`));
  const commands = [parts.join(' '), `refute resume ${shellQuote(run.dir)} --iterations 100`];
  for (const c of run.counterexamples.slice(0, 3))
    commands.push(`refute certify ${shellQuote(file)} ${shellQuote(c.graph6)}`);
  return commands;
}

/** At most this many points per plotted series; longer runs are bucketed. */
const MAX_PLOT_POINTS = 1500;

/** Buckets a long series: the best score of each bucket (the curve's envelope) and the mean elite score. */
export function downsampleSeries(
  series: ReadonlyArray<RunScorePoint>,
  max = MAX_PLOT_POINTS,
): RunScorePoint[] {
  if (series.length <= max) return [...series];
  const size = Math.ceil(series.length / max);
  const out: RunScorePoint[] = [];
  for (let i = 0; i < series.length; i += size) {
    const bucket = series.slice(i, i + size);
    const best = Math.max(...bucket.map((p) => p.best));
    const finite = bucket.map((p) => p.eliteMean).filter(Number.isFinite);
    const eliteMean = finite.length ? finite.reduce((a, b) => a + b, 0) / finite.length : -Infinity;
    out.push({ iteration: bucket[bucket.length - 1].iteration, best, eliteMean });
  }
  return out;
}

/** The whole report page. */
export function renderRunReport(input: ReportInput): string {
  const { run } = input;
  const m = run.manifest as Record<string, unknown> & {
    conjecture?: Record<string, unknown>;
    options?: Record<string, unknown>;
  };
  const name = String(m.conjecture?.name ?? 'conjecture');
  const top = input.top ?? 6;
  const iterations = input.series.length ? input.series[input.series.length - 1].iteration : 0;
  const html: string[] = [];
  html.push('<!DOCTYPE html>', '<html lang="en">', '<head>', '<meta charset="utf-8">');
  html.push(`<title>refute run: ${esc(name)}</title>`, `<style>${CSS}</style>`, '</head>', '<body>');
  html.push(`<h1>${esc(name)}</h1>`);
  html.push(
    input.statement !== null
      ? `<p class="statement">${esc(input.statement)}</p>`
      : `<p class="muted">Statement not shown: ${esc(input.statementNote ?? 'the conjecture file could not be read')}.</p>`,
  );
  const nCounter = run.counterexamples.length;
  html.push(
    `<p>${nCounter === 0 ? 'No counterexample found' : `<strong>${nCounter} counterexample${nCounter > 1 ? 's' : ''}</strong> found`} in ${iterations + (input.series.length ? 1 : 0)} iterations.</p>`,
  );

  html.push('<h2>Run</h2>', '<table>');
  const rows: Array<[string, unknown]> = [
    ['conjecture file', m.conjecture?.path],
    ['file sha256', m.conjecture?.sha256],
    ['tool version', m.toolVersion],
    ['started', m.startedAt],
    ['backend', m.backend],
    ...Object.entries(m.options ?? {}).map(
      ([k, v]) => [k, Array.isArray(v) ? v.join(',') : v] as [string, unknown],
    ),
  ];
  for (const [k, v] of rows)
    if (v !== undefined) html.push(`<tr><th>${esc(k)}</th><td><code>${esc(v)}</code></td></tr>`);
  html.push('</table>');

  html.push('<h2>Score over iterations</h2>');
  if (input.series.length === 0) html.push('<p class="muted">log.jsonl has no iteration records yet.</p>');
  else {
    const plotted = downsampleSeries(input.series);
    html.push(
      scorePlotSvg(
        [
          {
            label: 'best in batch',
            colour: '#1f77b4',
            points: plotted.map((p) => [p.iteration, p.best] as const),
          },
          {
            label: 'elite mean',
            colour: '#ff7f0e',
            points: plotted.map((p) => [p.iteration, p.eliteMean] as const),
          },
        ],
        {
          title: 'score (> 0 refutes)',
          xLabel: 'iteration',
          yLabel: 'score',
          width: 900,
          height: 320,
          integerX: true,
        },
      ),
    );
  }

  html.push('<h2>Counterexamples</h2>');
  if (nCounter === 0) html.push('<p class="muted">None yet.</p>');
  else html.push('<div class="grid">', ...run.counterexamples.map((c, i) => card(c, i, true)), '</div>');

  html.push(`<h2>Best graphs (top ${Math.min(top, run.best.length)} of ${run.best.length})</h2>`);
  if (run.best.length === 0) html.push('<p class="muted">None yet.</p>');
  else
    html.push(
      '<div class="grid">',
      ...run.best.slice(0, top).map((c, i) => card(c, 1000 + i, false)),
      '</div>',
    );

  const near =
    run.summary && Array.isArray(run.summary.nearMisses) ? (run.summary.nearMisses as RunSummaryGraph[]) : [];
  html.push('<h2>Near misses at other orders</h2>');
  if (near.length === 0) html.push('<p class="muted">None recorded.</p>');
  else html.push('<div class="grid">', ...near.map((c, i) => card(c, 2000 + i, true)), '</div>');

  html.push('<h2>Reproduce</h2>', '<pre>', ...reproduceCommands(run).map(esc), '</pre>');
  html.push(
    '<p class="muted">Same seed and options give the same results byte for byte, whatever the thread count.</p>',
  );
  html.push('</body>', '</html>');
  return html.join('\n') + '\n';
}
