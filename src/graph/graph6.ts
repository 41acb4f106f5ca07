/**
 * graph6: the compact printable encoding of undirected graphs.
 *
 * Follows B. D. McKay, "Description of graph6, sparse6 and digraph6 encodings"
 * (https://users.cecs.anu.edu.au/~bdm/data/formats.txt). A graph is N(n) followed by R(x),
 * where x lists the upper triangle of the adjacency matrix column by column
 * (x(0,1), x(0,2), x(1,2), x(0,3), ...), padded with zero bits to a multiple of six, and each
 * group of six bits (big-endian) is written as the byte value + 63. N(n) is one byte n + 63 for
 * n <= 62; 126 and three bytes for n <= 258047; 126 126 and six bytes for n <= 68719476735.
 * A file may begin with the header `>>graph6<<` (no newline after it).
 */
import { type Graph, wordsForOrder } from './graph.js';
import { graphFromRows } from './builders.js';
import { InputError } from '../errors.js';

/** The optional header of a graph6 file. */
export const GRAPH6_HEADER = '>>graph6<<';

/** Largest order the three forms of N(n) can express. */
export const GRAPH6_MAX_ORDER = 68719476735;

/** Where a graph6 string came from, for error messages: "stdin line 4", "argument 2". */
export interface Graph6Source {
  readonly where?: string;
}

/** A malformed graph6 string. The message names where it came from and what is wrong. */
export class Graph6ParseError extends InputError {
  constructor(
    readonly where: string,
    readonly problem: string,
  ) {
    super(`graph6 ${where}: ${problem}`);
    this.name = 'Graph6ParseError';
  }
}

/** N(n) of the specification. */
export function encodeOrder(n: number): string {
  if (!Number.isInteger(n) || n < 0 || n > GRAPH6_MAX_ORDER) {
    throw new RangeError(`Expected an order in 0..${GRAPH6_MAX_ORDER} but found ${n}`);
  }
  if (n <= 62) return String.fromCharCode(n + 63);
  if (n <= 258047) {
    return '~' + [12, 6, 0].map((s) => String.fromCharCode(((n >>> s) & 63) + 63)).join('');
  }
  // Six 6-bit groups need 36 bits: beyond 32-bit bit operations, so use division.
  let out = '';
  let rest = n;
  for (let i = 0; i < 6; i++) {
    out = String.fromCharCode((rest % 64) + 63) + out;
    rest = Math.floor(rest / 64);
  }
  return '~~' + out;
}

function sixBits(s: string, i: number, where: string): number {
  const c = s.charCodeAt(i);
  if (c < 63 || c > 126) {
    const shown = c >= 33 && c <= 126 ? `'${s[i]}'` : `code ${c}`;
    throw new Graph6ParseError(
      where,
      `byte ${i + 1} is ${shown}, outside the graph6 range 63..126 ('?'..'~')`,
    );
  }
  return c - 63;
}

/**
 * Reads N(n) at the start of s. Returns the order and the offset where R(x) begins.
 */
export function decodeOrder(s: string, where = 'input'): { order: number; offset: number } {
  if (s.length === 0) throw new Graph6ParseError(where, 'empty string, expected a graph6 graph');
  const first = sixBits(s, 0, where);
  if (first < 63) return { order: first, offset: 1 };
  if (s.length >= 2 && s.charCodeAt(1) === 126) {
    if (s.length < 8)
      throw new Graph6ParseError(where, 'the order starts with ~~ but the 6 bytes that follow are missing');
    let n = 0;
    for (let i = 2; i < 8; i++) n = n * 64 + sixBits(s, i, where);
    if (n <= 258047)
      throw new Graph6ParseError(where, `order ${n} is written in the 8-byte form, which is for n > 258047`);
    return { order: n, offset: 8 };
  }
  if (s.length < 4)
    throw new Graph6ParseError(where, 'the order starts with ~ but the 3 bytes that follow are missing');
  const n = (sixBits(s, 1, where) << 12) | (sixBits(s, 2, where) << 6) | sixBits(s, 3, where);
  if (n <= 62)
    throw new Graph6ParseError(where, `order ${n} is written in the 4-byte form, which is for n > 62`);
  return { order: n, offset: 4 };
}

/** Number of bytes of R(x) for order n. */
export function graph6DataLength(n: number): number {
  return Math.ceil((n * (n - 1)) / 2 / 6);
}

/** The graph6 string of g (no header, no newline). */
export function encodeGraph6(g: Graph): string {
  const n = g.order;
  const bytes = new Uint8Array(graph6DataLength(n));
  const { rows, wordsPerRow } = g;
  let k = 0;
  for (let j = 1; j < n; j++) {
    const base = j * wordsPerRow;
    for (let i = 0; i < j; i++, k++) {
      if ((rows[base + (i >>> 5)] >>> (i & 31)) & 1) bytes[(k / 6) | 0] |= 32 >>> (k % 6);
    }
  }
  let out = encodeOrder(n);
  // Build in chunks: String.fromCharCode(...big array) overflows the stack for large n.
  for (let start = 0; start < bytes.length; start += 8192) {
    const chunk = bytes.subarray(start, start + 8192).map((b) => b + 63);
    out += String.fromCharCode(...chunk);
  }
  return out;
}

/** Largest order decodeGraph6 builds a graph for (the bitset type's own bound). */
const DECODE_MAX_ORDER = 1 << 16;

/**
 * Parses one graph6 string (a header prefix and surrounding whitespace are allowed).
 *
 * @throws Graph6ParseError naming `where` and the problem: a byte outside 63..126, a wrong
 * length for the order, or padding bits that are not zero.
 */
export function decodeGraph6(text: string, where = 'input'): Graph {
  let s = text.trim();
  if (s.startsWith(GRAPH6_HEADER)) s = s.slice(GRAPH6_HEADER.length);
  if (s.startsWith(':') || s.startsWith(';') || s.startsWith('&')) {
    const kind = s[0] === '&' ? 'digraph6' : 'sparse6';
    throw new Graph6ParseError(where, `this is ${kind}, not graph6; convert it to graph6 first`);
  }
  // Check every byte first: a stray character is a clearer diagnosis than the length it causes.
  for (let i = 0; i < s.length; i++) sixBits(s, i, where);
  const { order: n, offset } = decodeOrder(s, where);
  if (n > DECODE_MAX_ORDER)
    throw new Graph6ParseError(where, `order ${n} exceeds the largest supported order ${DECODE_MAX_ORDER}`);
  const expected = graph6DataLength(n);
  const found = s.length - offset;
  if (found !== expected) {
    throw new Graph6ParseError(where, `expected ${expected} data bytes for n=${n} but found ${found}`);
  }
  const data = new Uint8Array(expected);
  for (let b = 0; b < expected; b++) data[b] = sixBits(s, offset + b, where);
  const pairs = (n * (n - 1)) / 2;
  if (pairs % 6 !== 0) {
    const unused = 6 - (pairs % 6);
    if ((data[expected - 1] & ((1 << unused) - 1)) !== 0) {
      throw new Graph6ParseError(
        where,
        `the last ${unused} padding bits must be zero but '${s[s.length - 1]}' sets some`,
      );
    }
  }
  const wordsPerRow = wordsForOrder(n);
  const rows = new Uint32Array(n * wordsPerRow);
  let k = 0;
  for (let j = 1; j < n; j++) {
    for (let i = 0; i < j; i++, k++) {
      if ((data[(k / 6) | 0] >>> (5 - (k % 6))) & 1) {
        rows[i * wordsPerRow + (j >>> 5)] |= 1 << (j & 31);
        rows[j * wordsPerRow + (i >>> 5)] |= 1 << (i & 31);
      }
    }
  }
  return graphFromRows(n, rows);
}
