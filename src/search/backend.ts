/**
 * Choosing and starting the tfjs backend: tfjs-node when the user has installed it (native
 * TensorFlow, fastest), otherwise the WebAssembly backend (XNNPACK kernels, SIMD), otherwise
 * tfjs's plain JavaScript CPU backend. A failed import of tfjs-node falls back silently, since
 * it is an optional extra.
 *
 * @remarks Different backends round differently, so a run records its backend in run.json and
 * a resumed run should use the same one to stay bit-identical.
 */
import * as tf from '@tensorflow/tfjs';

export type TfModule = typeof tf;

let started: Promise<string> | undefined;

async function tryNative(): Promise<boolean> {
  try {
    // A variable module name keeps bundlers and the type checker from requiring the package.
    const name = '@tensorflow/tfjs-node';
    await import(name);
    return tf.findBackend('tensorflow') !== null || (await tf.setBackend('tensorflow'));
  } catch {
    return false;
  }
}

/**
 * Starts tfjs once per process and resolves to the backend's name. `threads` sets the wasm
 * backend's thread count where the platform supports it (it must be set before start-up).
 */
export function startTensorflow(threads = 1, preferNative = true): Promise<string> {
  started ??= (async () => {
    if (preferNative && (await tryNative())) {
      await tf.setBackend('tensorflow');
      return 'tensorflow';
    }
    const wasm = await import('@tensorflow/tfjs-backend-wasm');
    wasm.setThreadsCount(Math.max(1, threads));
    if (await tf.setBackend('wasm')) {
      await tf.ready();
      return 'wasm';
    }
    await tf.setBackend('cpu');
    await tf.ready();
    return 'cpu';
  })();
  return started;
}

export { tf };
