// `npm run mutation [-- --mutate shared/domain/some-file.ts]`: Stryker over the engine, then the
// score with the mutants listed in equivalent.json left out (see score.ts).
import { runInherit } from '../lib/run';
import { printScore } from './score';

const code = await runInherit('node_modules/.bin/stryker', ['run', 'scripts/mutation/stryker.config.mjs', ...process.argv.slice(2)]);
if (code !== 0) process.exit(code);
process.exit(printScore() ? 0 : 1);
