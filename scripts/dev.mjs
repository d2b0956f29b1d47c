// Development: the engine and the API recompile on save, the API restarts, and Vite serves the
// web app with hot reload on http://localhost:5173, proxying /api to the API on port 3000.
import { spawn, spawnSync } from 'node:child_process';

const npx = process.platform === 'win32' ? 'npx.cmd' : 'npx';
const env = { ...process.env, NODE_ENV: 'development', PORT: process.env.PORT ?? '3000' };

for (const project of ['packages/buoyancy/tsconfig.build.json', 'api/tsconfig.build.json']) {
  const result = spawnSync(npx, ['tsc', '-p', project], { stdio: 'inherit', env });
  if (result.status !== 0) process.exit(result.status ?? 1);
}

const processes = [
  [
    'engine',
    npx,
    ['tsc', '-p', 'packages/buoyancy/tsconfig.build.json', '--watch', '--preserveWatchOutput'],
  ],
  ['api:tsc', npx, ['tsc', '-p', 'api/tsconfig.build.json', '--watch', '--preserveWatchOutput']],
  ['api', process.execPath, ['--watch', 'api/dist/main.js']],
  ['web', npx, ['vite'], 'web'],
].map(([name, command, args, cwd = '.']) => {
  const child = spawn(command, args, { cwd, env, stdio: ['ignore', 'pipe', 'pipe'] });
  const prefix = `[${name}] `;
  const relay = (stream) => (chunk) =>
    stream.write(
      chunk
        .toString()
        .split('\n')
        .filter((line) => line.length > 0)
        .map((line) => prefix + line + '\n')
        .join(''),
    );
  child.stdout.on('data', relay(process.stdout));
  child.stderr.on('data', relay(process.stderr));
  return child;
});

const stopAll = () => {
  for (const child of processes) child.kill('SIGTERM');
  process.exit(0);
};
process.on('SIGINT', stopAll);
process.on('SIGTERM', stopAll);
