// `npm run bench`: every benchmark of the shared engine and solver, printing median and p95 per case.
import { benchDemoParty } from './demo-party.js';
import { benchEngine } from './engine.js';
import { benchOptimise } from './optimise.js';
import { benchParty } from './party.js';
import { benchPlanning } from './planning.js';

benchEngine();
benchOptimise();
benchParty();
benchPlanning();
benchDemoParty();
