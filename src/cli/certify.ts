/**
 * `refute certify FILE G6... [--conjecture NAME] [--json]`: an exact certificate for each graph
 * against the conjecture — the graph (graph6 and edges), each invariant the score read with its
 * exact value or isolating interval and characteristic polynomial, the score's margin against
 * the rounding bound, and the verdict. Exit 0 when at least one graph is a certified
 * counterexample, 1 when none is, 2 on bad input (every graph is decoded before anything is
 * written, so a malformed one leaves no output behind).
 */
import { type Command } from 'commander';
import { InputError } from '../errors.js';
import { decodeGraph6 } from '../graph/graph6.js';
import { loadConjectureFile, selectConjecture } from '../conjecture/load.js';
import { certifyCounterexample } from '../certify/certify.js';
import { certificateToJson, formatCertificate } from '../certify/format.js';
import { type CommandOutcome } from './main.js';
import { writeOut } from './output.js';

interface CertifyOptions {
  conjecture?: string;
  json?: boolean;
}

export function addCertifyCommand(program: Command, outcome: CommandOutcome): void {
  program
    .command('certify')
    .description('exact certificate for each graph: is it a counterexample beyond rounding?')
    .argument('<file>', 'conjecture file (.ts)')
    .argument('[graph6...]', 'graphs in graph6')
    .option('--conjecture <name>', 'which conjecture, when the file exports several')
    .option('--json', 'one JSON object per graph and line')
    .action(async (file: string, graphs: string[], opts: CertifyOptions) => {
      if (graphs.length === 0) {
        throw new InputError(
          `no graphs given: pass graph6 strings after the file (example: refute certify ${file} 'DhC')`,
        );
      }
      const decoded = graphs.map((text, i) => decodeGraph6(text, `argument ${i + 2}`));
      const conjecture = selectConjecture(await loadConjectureFile(file), opts.conjecture);
      // Certify everything first: a score that fails on some graph then leaves no output behind.
      const certificates = decoded.map((g) => certifyCounterexample(conjecture, g));
      let text = '';
      certificates.forEach((cert, i) => {
        text += opts.json
          ? JSON.stringify(certificateToJson(cert)) + '\n'
          : (i > 0 ? '\n' : '') + formatCertificate(cert);
      });
      await writeOut(text);
      outcome.status = certificates.some((c) => c.certified) ? 0 : 1;
    });
}
