/**
 * Graphs named on the command line or streamed on stdin as graph6, one per line. Streaming is
 * line by line so a stream of any length is read in constant memory. Blank lines are skipped;
 * a header `>>graph6<<` is accepted at the start of a line.
 */
import { createInterface } from 'node:readline';
import { type Graph } from '../graph/graph.js';
import { decodeGraph6 } from '../graph/graph6.js';

/** One graph read, with where it came from (for messages) and its graph6 text as given. */
export interface GraphInput {
  readonly graph: Graph;
  readonly graph6: string;
  readonly where: string;
}

/** Graphs from positional arguments ("argument 1", ...) then, when asked, from stdin ("stdin line k"). */
export async function* readGraphInputs(
  args: ReadonlyArray<string>,
  fromStdin: boolean,
  stdin: NodeJS.ReadableStream = process.stdin,
): AsyncGenerator<GraphInput> {
  for (let i = 0; i < args.length; i++) {
    const where = `argument ${i + 1}`;
    yield { graph: decodeGraph6(args[i], where), graph6: args[i].trim(), where };
  }
  if (!fromStdin) return;
  const lines = createInterface({ input: stdin, crlfDelay: Infinity });
  let lineNumber = 0;
  for await (const line of lines) {
    lineNumber++;
    const text = line.trim();
    if (text === '') continue;
    const where = `stdin line ${lineNumber}`;
    yield { graph: decodeGraph6(text, where), graph6: text.replace(/^>>graph6<</, ''), where };
  }
}
