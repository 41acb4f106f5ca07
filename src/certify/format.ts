/**
 * How a certificate is written: for people (`refute certify`), every value a referee needs to
 * re-check the verdict by hand; and as JSON (`--json`), with exact rational endpoints and the
 * integer coefficients of every characteristic polynomial used.
 */
import { formatNumber } from '../invariants/encode.js';
import { type Certificate, type CertifiedInput, type Verdict } from './certify.js';
import { degree, formatPolynomial, type IntPolynomial } from './polynomial.js';
import {
  type Rational,
  compare,
  formatDecimalAbove,
  formatDecimalBelow,
  formatRational,
} from './rational.js';
import { type Enclosure, type SpectrumEvidence } from './spectral-enclosures.js';

const VERDICT_TEXT: Record<Verdict, string> = {
  certified: 'CERTIFIED COUNTEREXAMPLE',
  holds: 'holds (not a counterexample)',
  equality: 'holds (equality, to within rounding) — not certified',
  'numerical-only': 'numerical only — not certified',
  'outside-domain': 'outside the domain — not a counterexample',
  disagreement: 'DISAGREEMENT between two computations — not certified',
};

/** Digits after the point in the human form of an enclosure (rounded outward, so still an enclosure). */
const DIGITS = 20;

function isPoint(e: Enclosure): boolean {
  return compare(e.lo, e.hi) === 0;
}

function trimZeros(s: string): string {
  return s.includes('.') ? s.replace(/0+$/, '').replace(/\.$/, '') : s;
}

function formatExactRational(r: Rational): string {
  if (r.den === 1n) return r.num.toString();
  return `${formatRational(r)} ≈ ${trimZeros(formatDecimalBelow(r, DIGITS))}`;
}

/** "[lo, hi]" in decimals rounded outward, or the exact value. */
export function formatEnclosure(e: Enclosure): string {
  if (isPoint(e)) return formatExactRational(e.lo);
  return `[${formatDecimalBelow(e.lo, DIGITS)}, ${formatDecimalAbove(e.hi, DIGITS)}]`;
}

/** The square-free factorisation, e.g. "(x - 3) * (x + 2)^4 * (x - 1)^5". */
export function formatFactorisation(factors: readonly IntPolynomial[]): string {
  const parts: string[] = [];
  factors.forEach((f, i) => {
    if (degree(f) <= 0) return;
    const body = `(${formatPolynomial(f)})`;
    parts.push(i === 0 ? body : `${body}^${i + 1}`);
  });
  return parts.length === 0 ? '1' : parts.join(' * ');
}

function matrixName(e: SpectrumEvidence): string {
  switch (e.matrix) {
    case 'adjacency':
      return 'A';
    case 'laplacian':
      return 'L = D - A';
    case 'signlessLaplacian':
      return 'Q = D + A';
    case 'distance':
      return 'the distance matrix';
    case 'distanceLaplacian':
      return 'Tr - (distance matrix)';
    case 'normalizedLaplacian':
      return `N = ${e.scale} D^-1 L on the non-isolated vertices`;
  }
}

function formatFloat(v: unknown): string {
  if (v === undefined) return '(not computed)';
  if (typeof v === 'number') return Number.isInteger(v) || !Number.isFinite(v) ? formatNumber(v) : String(v);
  if (typeof v === 'bigint') return v.toString();
  if (typeof v === 'boolean') return v ? 'yes' : 'no';
  if (Array.isArray(v)) return v.map(formatFloat).join(' ');
  return String(v);
}

function inputLines(c: CertifiedInput, seenPolynomials: Set<string>): string[] {
  const lines: string[] = [];
  if (c.status === 'unconfirmed') {
    lines.push(`    ${c.key} = ${formatFloat(c.floatValue)}  NUMERICAL ONLY: ${c.reason}`);
    return lines;
  }
  if (c.status === 'exact') {
    lines.push(
      `    ${c.key} = ${formatFloat(c.value)}  exact (registry ${formatFloat(c.floatValue)}; second method: ${c.method})`,
    );
  } else if (c.isList) {
    lines.push(`    ${c.key}  certified, one enclosure per entry (registry ${formatFloat(c.floatValue)}):`);
    for (const e of c.enclosures) lines.push(`        ${formatEnclosure(e)}`);
    lines.push(`      method: ${c.method}`);
  } else {
    const e = c.enclosures[0];
    const shown = isPoint(e) ? `= ${formatEnclosure(e)}  exact` : `∈ ${formatEnclosure(e)}`;
    lines.push(`    ${c.key} ${shown}  (registry ${formatFloat(c.floatValue)})`);
    lines.push(`      method: ${c.method}`);
  }
  const ev = c.evidence;
  if (ev !== undefined) {
    const id = `${c.key.startsWith('complement.') ? 'complement ' : ''}${ev.matrix}`;
    if (seenPolynomials.has(id)) {
      lines.push(
        `      (characteristic polynomial of ${c.key.startsWith('complement.') ? "the complement's " : ''}${matrixName(ev)} as above)`,
      );
    } else {
      seenPolynomials.add(id);
      const of = c.key.startsWith('complement.') ? " of the complement's" : ' of';
      lines.push(`      det(xI - M)${of} M = ${matrixName(ev)}:`);
      lines.push(`        ${formatPolynomial(ev.characteristicPolynomial)}`);
      lines.push(
        `        = ${formatFactorisation(ev.squareFreeFactors)}  (square-free factors; exponent = multiplicity)`,
      );
      if (ev.scale !== 1n)
        lines.push(
          `        eigenvalues = roots / ${ev.scale}${ev.extraZeros > 0 ? `, plus 0 for each of ${ev.extraZeros} isolated vertices` : ''}`,
        );
    }
  }
  return lines;
}

/** The human certificate. */
export function formatCertificate(cert: Certificate): string {
  const lines: string[] = [];
  lines.push(`certificate: conjecture '${cert.conjecture}', graph ${cert.graph6}`);
  lines.push(`  claim     ${cert.statement}`);
  lines.push(`  graph     n = ${cert.order}, m = ${cert.size}`);
  lines.push(
    `  edges     ${cert.edges.length === 0 ? '(none)' : cert.edges.map(([u, v]) => `${u}-${v}`).join(' ')}`,
  );
  lines.push(`  verdict   ${VERDICT_TEXT[cert.verdict]}`);
  lines.push(`  why       ${cert.reason}`);
  if (cert.floatScore !== null || cert.lowerScore !== null) {
    lines.push(
      `  score     float ${cert.floatScore === null ? '(outside the domain)' : formatScore(cert.floatScore)}; ` +
        `over the certified box ${cert.lowerScore === null ? '(not everywhere defined)' : `[${formatScore(cert.lowerScore)}, ${formatScore(cert.upperScore!)}]`}`,
    );
    lines.push(
      `  rounding  τ = ${cert.roundingBound.toExponential(3)}; each certified real input widened by ${cert.boxRadius.toExponential(3)} relative; ${cert.pointsEvaluated} points evaluated`,
    );
  }
  lines.push(cert.inputs.length === 0 ? '  inputs    (the score reads no invariant)' : '  inputs');
  const seen = new Set<string>();
  for (const c of cert.inputs) lines.push(...inputLines(c, seen));
  return lines.join('\n') + '\n';
}

function formatScore(x: number): string {
  return Number.isFinite(x) ? String(x) : x > 0 ? 'Infinity' : '-Infinity';
}

function rationalJson(r: Rational): string {
  return formatRational(r);
}

function enclosureJson(e: Enclosure): Record<string, string> {
  return isPoint(e)
    ? { exact: rationalJson(e.lo) }
    : {
        lo: rationalJson(e.lo),
        hi: rationalJson(e.hi),
        loDecimal: formatDecimalBelow(e.lo, 20),
        hiDecimal: formatDecimalAbove(e.hi, 20),
      };
}

function valueJson(v: unknown): unknown {
  if (typeof v === 'bigint') return v.toString();
  if (typeof v === 'number' && !Number.isFinite(v))
    return Number.isNaN(v) ? 'NaN' : v > 0 ? 'Infinity' : '-Infinity';
  if (Array.isArray(v)) return v.map(valueJson);
  return v;
}

function polynomialJson(p: IntPolynomial): { text: string; coefficients: string[] } {
  return { text: formatPolynomial(p), coefficients: p.map((c) => c.toString()) };
}

function inputJson(c: CertifiedInput): Record<string, unknown> {
  const out: Record<string, unknown> = { key: c.key, status: c.status, float: valueJson(c.floatValue) };
  if (c.status === 'unconfirmed') {
    out.reason = c.reason;
    return out;
  }
  out.method = c.method;
  if (c.status === 'exact') out.value = valueJson(c.value);
  else
    out[c.isList ? 'enclosures' : 'enclosure'] = c.isList
      ? c.enclosures.map(enclosureJson)
      : enclosureJson(c.enclosures[0]);
  if (c.evidence !== undefined) {
    out.characteristicPolynomial = {
      matrix: c.evidence.matrix,
      ...polynomialJson(c.evidence.characteristicPolynomial),
      squareFreeFactors: c.evidence.squareFreeFactors
        .map((f, i) => ({ multiplicity: i + 1, ...polynomialJson(f) }))
        .filter((f) => f.coefficients.length > 1),
      scale: c.evidence.scale.toString(),
      extraZeros: c.evidence.extraZeros,
    };
  }
  return out;
}

/** The JSON form (one object; rationals as "p/q" strings, big integers as decimal strings). */
export function certificateToJson(cert: Certificate): Record<string, unknown> {
  return {
    conjecture: cert.conjecture,
    statement: cert.statement,
    graph6: cert.graph6,
    order: cert.order,
    size: cert.size,
    edges: cert.edges,
    verdict: cert.verdict,
    certified: cert.certified,
    reason: cert.reason,
    floatScore: valueJson(cert.floatScore),
    centreScore: valueJson(cert.centreScore),
    lowerScore: valueJson(cert.lowerScore),
    upperScore: valueJson(cert.upperScore),
    roundingBound: cert.roundingBound,
    boxRadius: cert.boxRadius,
    pointsEvaluated: cert.pointsEvaluated,
    numerical: cert.numerical,
    disagreements: cert.disagreements,
    inputs: cert.inputs.map(inputJson),
  };
}
