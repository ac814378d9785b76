// `npm run bench`: every benchmark of the shared engine and solver, printing median and p95 per case.
//
// Each group runs in its own child process (a fresh JavaScript engine), as benchmark harnesses fork per benchmark: code
// compiled for one group's inputs is not the code another group then runs, and a server's solver thread runs only
// plans. Run in one process after the synthetic groups, the 50-item plan's p95 read 125–166 ms against 80–105 ms on
// its own (2026-12-04).
import { fork } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { benchDemoParty } from './demo-party.js';
import { benchEngine } from './engine.js';
import { benchOptimise } from './optimise.js';
import { benchParty } from './party.js';
import { benchPlanning } from './planning.js';

const groups: Record<string, () => void> = {
  engine: benchEngine,
  optimise: benchOptimise,
  party: benchParty,
  planning: benchPlanning,
  'demo-party': benchDemoParty,
};

const group = process.argv[2];
if (group) {
  const run = groups[group];
  if (!run) throw new Error(`Unknown bench group "${group}"; known: ${Object.keys(groups).join(', ')}.`);
  run();
} else {
  for (const name of Object.keys(groups)) {
    const code = await new Promise<number | null>((resolve) =>
      fork(fileURLToPath(import.meta.url), [name], { stdio: 'inherit' }).on('exit', resolve),
    );
    if (code !== 0) throw new Error(`Bench group "${name}" failed (exit code ${code}).`);
  }
}
