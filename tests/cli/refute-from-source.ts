// Runs the CLI from the TypeScript sources (node --import tsx tests/cli/refute-from-source.ts ...),
// so end-to-end tests need no build.
import { main } from '../../src/cli/main.js';

main(process.argv).then((code) => {
  process.exitCode = code;
});
