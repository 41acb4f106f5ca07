/** The polisher tests' false claim, loaded from its conjecture file (one definition for all). */
import { fileURLToPath } from 'node:url';
import { fromEdges } from '../../src/graph/builders.js';
import { loadConjectureFile, selectConjecture } from '../../src/conjecture/load.js';

export const SPECTRAL_GAP_FILE = fileURLToPath(
  new URL('../fixtures/conjectures/triangle-free-spectral-gap.ts', import.meta.url),
);
export const SPECTRAL_GAP = selectConjecture(await loadConjectureFile(SPECTRAL_GAP_FILE));

/** A spider: centre 0 with three leaves (4, 5, 6) and three legs of length 2 (0-1-7, 0-2-8, 0-3-9),
 * three leaf moves from the star K_{1,9}, which refutes the claim: a near miss to polish. */
export const SPIDER = fromEdges(10, [
  [0, 1],
  [0, 2],
  [0, 3],
  [0, 4],
  [0, 5],
  [0, 6],
  [1, 7],
  [2, 8],
  [3, 9],
]);
