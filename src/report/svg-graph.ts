/**
 * SVG drawing of one graph: straight-line edges, numbered vertex discs (optionally coloured by a
 * vertex value), and a caption (graph6, n, m and, when known, the score). Pure string output;
 * the same graph, layout and seed give the same bytes.
 */
import { type Graph, edgeList } from '../graph/graph.js';
import { encodeGraph6 } from '../graph/graph6.js';
import {
  distanceMatrix,
  eccentricitiesFromDistances,
  transmissionsFromDistances,
} from '../invariants/distances.js';
import { formatNumber } from '../invariants/encode.js';
import { layoutGraph, type LayoutKind, type Point } from './layout.js';
import { needsLightText, sequentialColour } from './palette.js';

export type VertexColouring = 'none' | 'degree' | 'eccentricity' | 'transmission';

export interface DrawOptions {
  readonly layout?: LayoutKind;
  readonly seed?: string;
  readonly colourBy?: VertexColouring;
  /** Extra caption lines, e.g. the score and the verdict. */
  readonly caption?: ReadonlyArray<string>;
  /** Side of the square drawing area in pixels. */
  readonly size?: number;
}

const DEFAULTS = {
  layout: 'auto' as LayoutKind,
  seed: 'refute',
  colourBy: 'none' as VertexColouring,
  size: 360,
};

/** Escapes text for XML character data and attribute values. */
export function xmlEscape(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

/** Per-vertex values for the colouring (Infinity where undefined, e.g. disconnected). */
export function vertexValues(g: Graph, colourBy: VertexColouring): number[] | null {
  if (colourBy === 'none') return null;
  if (colourBy === 'degree') return Array.from(g.degrees);
  const dist = distanceMatrix(g);
  return colourBy === 'eccentricity'
    ? eccentricitiesFromDistances(dist, g.order)
    : transmissionsFromDistances(dist, g.order);
}

/** Positions of the drawing, in pixels (for tests and the report). */
export function drawingPositions(g: Graph, options: DrawOptions = {}): Point[] {
  const o = { ...DEFAULTS, ...options };
  const margin = 24;
  return layoutGraph(g, o.layout, o.seed).map((p) => ({
    x: round(margin + p.x * (o.size - 2 * margin)),
    y: round(margin + p.y * (o.size - 2 * margin)),
  }));
}

function round(x: number): number {
  return Math.round(x * 100) / 100;
}

/** The drawing as a standalone SVG document. */
export function graphToSvg(g: Graph, options: DrawOptions = {}): string {
  const o = { ...DEFAULTS, ...options };
  const pos = drawingPositions(g, o);
  const radius = g.order > 40 ? 6 : 11;
  const values = vertexValues(g, o.colourBy);
  const finite = values?.filter((v) => Number.isFinite(v)) ?? [];
  const lo = finite.length ? Math.min(...finite) : 0;
  const hi = finite.length ? Math.max(...finite) : 0;
  const caption = [`${encodeGraph6(g)}   n = ${g.order}, m = ${g.size}`, ...(o.caption ?? [])];
  if (values) caption.push(`colour: ${o.colourBy} ${formatNumber(lo)} (dark) to ${formatNumber(hi)} (light)`);
  const lineHeight = 16;
  const height = o.size + caption.length * lineHeight + 8;
  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" width="${o.size}" height="${height}" viewBox="0 0 ${o.size} ${height}" font-family="Helvetica, Arial, sans-serif">`,
  );
  out.push(`<rect width="${o.size}" height="${height}" fill="#ffffff"/>`);
  out.push('<g class="edges" stroke="#555555" stroke-width="1.6">');
  for (const [u, v] of edgeList(g)) {
    out.push(`<line x1="${pos[u].x}" y1="${pos[u].y}" x2="${pos[v].x}" y2="${pos[v].y}"/>`);
  }
  out.push('</g>');
  out.push(`<g class="vertices" font-size="${radius > 8 ? 11 : 8}" text-anchor="middle">`);
  for (let v = 0; v < g.order; v++) {
    const fill = values ? sequentialColour(hi > lo ? (values[v] - lo) / (hi - lo) : 0.5) : '#ffffff';
    const text = values && needsLightText(fill) ? '#ffffff' : '#111111';
    out.push(
      `<circle cx="${pos[v].x}" cy="${pos[v].y}" r="${radius}" fill="${fill}" stroke="#222222" stroke-width="1.2"/>` +
        `<text x="${pos[v].x}" y="${round(pos[v].y + radius * 0.36)}" fill="${text}">${v}</text>`,
    );
  }
  out.push('</g>');
  out.push('<g class="caption" font-size="12" fill="#222222">');
  caption.forEach((line, i) =>
    out.push(`<text x="8" y="${o.size + (i + 1) * lineHeight}">${xmlEscape(line)}</text>`),
  );
  out.push('</g>');
  out.push('</svg>');
  return out.join('\n') + '\n';
}
