/**
 * Plain-text graph formats for people and other tools (`refute dump --format adjacency|edges`).
 *
 * Edge list: a first line `n m`, then m lines `u v` (0-based, u < v, lexicographic order).
 * Adjacency list: one line per vertex, `v: a b c` with neighbours increasing (`v:` when
 * isolated), n lines in vertex order. In both, graphs in one text are separated by a blank line
 * and `#` starts a comment line. Both formats are common practice; neither has a single source.
 */
import { type Graph, neighbors, edgeList } from './graph.js';
import { fromEdges } from './builders.js';
import { InputError } from '../errors.js';

/** A malformed edge-list or adjacency-list text. */
export class TextFormatError extends InputError {
  constructor(format: string, where: string, line: number, problem: string) {
    super(`${format} ${where} line ${line}: ${problem}`);
    this.name = 'TextFormatError';
  }
}

/** Edge-list text of g, ending with a newline. */
export function formatEdgeList(g: Graph): string {
  const edges = edgeList(g);
  return `${g.order} ${edges.length}\n` + edges.map(([u, v]) => `${u} ${v}\n`).join('');
}

/** Adjacency-list text of g, ending with a newline. */
export function formatAdjacencyList(g: Graph): string {
  let out = '';
  for (let v = 0; v < g.order; v++) {
    const nb = neighbors(g, v);
    out += nb.length === 0 ? `${v}:\n` : `${v}: ${Array.from(nb).join(' ')}\n`;
  }
  return out;
}

interface Block {
  readonly firstLine: number;
  readonly lines: string[];
}

/** Splits text into blank-line separated blocks, dropping comments; keeps 1-based line numbers. */
function blocks(text: string): Block[] {
  const out: Block[] = [];
  let current: Block | null = null;
  text.split(/\r?\n/).forEach((raw, i) => {
    const line = raw.trim();
    if (line.startsWith('#')) return;
    if (line === '') {
      current = null;
      return;
    }
    if (current === null) {
      current = { firstLine: i + 1, lines: [] };
      out.push(current);
    }
    current.lines.push(line);
  });
  return out;
}

function parseVertex(token: string, n: number, format: string, where: string, line: number): number {
  if (!/^\d+$/.test(token))
    throw new TextFormatError(format, where, line, `expected a vertex number but found '${token}'`);
  const v = Number(token);
  if (v >= n) throw new TextFormatError(format, where, line, `vertex ${v} is out of range 0..${n - 1}`);
  return v;
}

/** Parses edge-list text (one or more graphs). */
export function parseEdgeList(text: string, where = 'input'): Graph[] {
  const F = 'edge list';
  return blocks(text).map(({ firstLine, lines }) => {
    const header = lines[0].split(/\s+/);
    if (header.length !== 2 || !header.every((t) => /^\d+$/.test(t))) {
      throw new TextFormatError(F, where, firstLine, `expected a header 'n m' but found '${lines[0]}'`);
    }
    const [n, m] = header.map(Number);
    if (n < 1) throw new TextFormatError(F, where, firstLine, `expected n >= 1 but found ${n}`);
    if (lines.length - 1 !== m) {
      throw new TextFormatError(
        F,
        where,
        firstLine,
        `the header announces ${m} edges but ${lines.length - 1} follow`,
      );
    }
    const edges: Array<[number, number]> = [];
    const seen = new Set<number>();
    for (let k = 1; k < lines.length; k++) {
      const line = firstLine + k;
      const tokens = lines[k].split(/\s+/);
      if (tokens.length !== 2)
        throw new TextFormatError(F, where, line, `expected 'u v' but found '${lines[k]}'`);
      const u = parseVertex(tokens[0], n, F, where, line);
      const v = parseVertex(tokens[1], n, F, where, line);
      if (u === v) throw new TextFormatError(F, where, line, `loop at vertex ${u}; graphs must be simple`);
      const key = Math.min(u, v) * n + Math.max(u, v);
      if (seen.has(key)) throw new TextFormatError(F, where, line, `edge ${u} ${v} is listed twice`);
      seen.add(key);
      edges.push([u, v]);
    }
    return fromEdges(n, edges);
  });
}

/** Parses adjacency-list text (one or more graphs); the lists must be symmetric. */
export function parseAdjacencyList(text: string, where = 'input'): Graph[] {
  const F = 'adjacency list';
  return blocks(text).map(({ firstLine, lines }) => {
    const n = lines.length;
    const lists: number[][] = [];
    lines.forEach((text, k) => {
      const line = firstLine + k;
      const match = /^(\d+)\s*:(.*)$/.exec(text);
      if (match === null)
        throw new TextFormatError(F, where, line, `expected 'v: neighbours' but found '${text}'`);
      if (Number(match[1]) !== k) {
        throw new TextFormatError(
          F,
          where,
          line,
          `expected the line of vertex ${k} but found vertex ${match[1]}`,
        );
      }
      const rest = match[2].trim();
      lists.push(rest === '' ? [] : rest.split(/\s+/).map((t) => parseVertex(t, n, F, where, line)));
    });
    const edges: Array<[number, number]> = [];
    lists.forEach((list, u) => {
      for (const v of list) {
        if (v === u)
          throw new TextFormatError(F, where, firstLine + u, `loop at vertex ${u}; graphs must be simple`);
        if (!lists[v].includes(u)) {
          throw new TextFormatError(F, where, firstLine + u, `${u} lists ${v} but ${v} does not list ${u}`);
        }
        if (u < v) edges.push([u, v]);
      }
    });
    return fromEdges(n, edges);
  });
}
