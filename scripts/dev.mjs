// `npm run dev`: the server in watch mode (through @swc-node/register, which keeps decorator metadata) and the
// Vite dev server, which proxies /api to it. Ctrl-C stops both.
import { spawn } from 'node:child_process';

const children = [
  spawn('npm', ['run', 'dev', '-w', 'server'], { stdio: 'inherit' }),
  spawn('npm', ['run', 'dev', '-w', 'client'], { stdio: 'inherit' }),
];
const stopAll = () => children.forEach((child) => child.kill('SIGTERM'));
process.once('SIGINT', stopAll);
process.once('SIGTERM', stopAll);
children.forEach((child) => child.once('exit', stopAll));
