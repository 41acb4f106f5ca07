/** The polisher tests' false claim, loaded from its conjecture file (one definition for all). */
import { fileURLToPath } from 'node:url';
import { loadConjectureFile, selectConjecture } from '../../src/conjecture/load.js';

export const SPECTRAL_GAP_FILE = fileURLToPath(
  new URL('../fixtures/conjectures/triangle-free-spectral-gap.ts', import.meta.url),
);
export const SPECTRAL_GAP = selectConjecture(await loadConjectureFile(SPECTRAL_GAP_FILE));
