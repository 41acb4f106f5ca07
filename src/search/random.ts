/**
 * Seeded random streams of the hunt, keyed by what they are for.
 *
 * Every random draw of a run comes from a stream named by (seed, purpose, iteration, index), so a
 * run depends only on its seed and options: not on how episodes are split across threads, and
 * not on being stopped and resumed (a resumed run re-creates exactly the streams it would have
 * used). The generator is Alea (J. Baagøe, "Alea" PRNG, 2010, as shipped by the seedrandom
 * package): fast to seed, which matters because every episode gets a fresh stream.
 */
import seedrandom from 'seedrandom';

/** A uniform generator on [0, 1). */
export type Rng = () => number;

/** The stream of episode `episode` of iteration `iteration` (the edge decisions of one graph). */
export function episodeRng(seed: string, iteration: number, episode: number): Rng {
  return seedrandom.alea(`${seed}\u0000episode\u0000${iteration}\u0000${episode}`);
}

/** A per-iteration stream for one purpose (training order, policy perturbation, ...). */
export function iterationRng(seed: string, purpose: string, iteration: number): Rng {
  return seedrandom.alea(`${seed}\u0000${purpose}\u0000${iteration}`);
}

/** A standard normal deviate from two uniforms (Box-Muller; G. E. P. Box, M. E. Muller, Ann. Math. Stat. 29 (1958) 610-611). */
export function normalDeviate(rng: Rng): number {
  let u = rng();
  while (u === 0) u = rng();
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rng());
}

/** Fisher-Yates shuffle of 0..length-1 (R. Durstenfeld, CACM 7(7) 1964, Algorithm 235). */
export function shuffledIndices(length: number, rng: Rng): Int32Array {
  const out = new Int32Array(length);
  for (let i = 0; i < length; i++) out[i] = i;
  for (let i = length - 1; i > 0; i--) {
    const j = Math.floor(rng() * (i + 1));
    const t = out[i];
    out[i] = out[j];
    out[j] = t;
  }
  return out;
}
