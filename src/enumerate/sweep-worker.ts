/**
 * Worker thread of a sweep (see sweep.ts): loads the conjecture file once, checks it is the file
 * the main thread loaded, then sweeps each unit it is sent and posts the result back.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { InputError } from '../errors.js';
import { loadConjectureFile, selectConjecture } from '../conjecture/load.js';
import { type Conjecture } from '../conjecture/types.js';
import { type EnumerationPart } from './graph-enumerator.js';
import { sweepPart } from './sweep-part.js';

interface WorkerData {
  readonly file: string;
  readonly sha256: string;
  readonly conjectureName?: string;
}

interface UnitMessage {
  readonly id: number;
  readonly order: number;
  readonly part: EnumerationPart;
}

const port = parentPort;
if (port === null) throw new Error('sweep-worker.ts must run as a worker thread');
const data = workerData as WorkerData;

/** Reports a failure; `id` names the unit it happened in (none when loading failed). */
function reportError(err: unknown, id?: number): void {
  const message = err instanceof Error ? err.message : String(err);
  port?.postMessage({ kind: 'error', id, message, input: err instanceof InputError });
}

let conjecture: Conjecture | null = null;
try {
  const file = await loadConjectureFile(data.file);
  if (file.sha256 !== data.sha256) {
    throw new InputError(`${data.file}: the conjecture file changed during the sweep; run the sweep again`);
  }
  conjecture = selectConjecture(file, data.conjectureName);
} catch (err) {
  reportError(err);
}
if (conjecture !== null) {
  const c = conjecture;
  port.on('message', (unit: UnitMessage) => {
    try {
      port.postMessage({ kind: 'result', id: unit.id, result: sweepPart(c, unit.order, unit.part) });
    } catch (err) {
      reportError(err, unit.id);
    }
  });
  port.postMessage({ kind: 'ready' });
}
