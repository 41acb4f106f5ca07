/**
 * The networkx reference values for every graph on 1..7 vertices
 * (tests/fixtures/atlas-invariants.json, written by tests/scripts/make_atlas_invariants.py).
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { type Graph } from '../../src/graph/graph.js';
import { decodeGraph6 } from '../../src/graph/graph6.js';

export interface AtlasRecord {
  graph6: string;
  order: number;
  matchingNumber: number;
  cliqueNumber: number;
  independenceNumber: number;
  vertexConnectivity: number;
  edgeConnectivity: number;
  bridgeCount: number;
  cutVertexCount: number;
  spanningTreeCount: number;
  distanceSpectrum: number[] | null;
  distanceLaplacianSpectrum: number[] | null;
}

export interface AtlasEntry {
  graph: Graph;
  ref: AtlasRecord;
}

const path = fileURLToPath(new URL('../fixtures/atlas-invariants.json', import.meta.url));

/** Every atlas graph with its reference values, in fixture order. */
export function atlasEntries(): AtlasEntry[] {
  const data = JSON.parse(readFileSync(path, 'utf8')) as { graphs: AtlasRecord[] };
  return data.graphs.map((ref) => ({ graph: decodeGraph6(ref.graph6, 'atlas-invariants.json'), ref }));
}
