#!/usr/bin/env node
// The first step of `npm start`, `npm test`, `npm run test:faults`, `npm run bench` and
// `npm run db:*`. It runs before any npm package is installed, so it is plain JavaScript
// with Node's built-ins only; it makes sure the system packages and the npm packages are
// there, then hands over to the TypeScript dev stack (packages/devstack) through tsx.
import { spawnSync, spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const [command, ...rest] = process.argv.slice(2);

const systemNeeds = {
  mariadb: {
    binaries: [
      '/usr/sbin/mariadbd',
      '/usr/bin/mariadb-install-db',
      '/usr/bin/mariadb-admin',
      '/usr/bin/mariadb',
    ],
    packages: ['mariadb-server-core', 'mariadb-client-core', 'mariadb-client'],
  },
  chromium: { binaries: ['/usr/bin/chromium'], packages: ['chromium'] },
};

function fail(message) {
  console.error(`\n${message}\n`);
  process.exit(1);
}

function checkNode() {
  const [major, minor] = process.versions.node.split('.').map(Number);
  if (major < 20 || (major === 20 && minor < 19)) {
    fail(`Skyledger needs Node.js 20.19 or newer; this is ${process.version}.`);
  }
}

function ensureSystemPackages(needs) {
  const missing = needs.filter((need) => need.binaries.some((binary) => !existsSync(binary)));
  if (missing.length === 0) return;
  const packages = missing.flatMap((need) => need.packages);
  const install = ['apt-get', 'install', '-y', '-q', '--no-install-recommends', ...packages];
  let prefix = [];
  if (process.getuid?.() !== 0) {
    const sudo = spawnSync('sudo', ['-n', 'true'], { stdio: 'ignore' });
    if (sudo.status !== 0) {
      fail(
        `Skyledger needs these Debian packages: ${packages.join(' ')}.\n` +
          `Install them as root, then run the command again:\n` +
          `  sudo apt-get update && sudo ${install.join(' ')}`,
      );
    }
    prefix = ['sudo', '-n'];
  }
  console.info(`Installing Debian packages: ${packages.join(' ')}`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  for (const step of [['apt-get', 'update', '-q'], install]) {
    const args = [...prefix, ...step];
    const result = spawnSync(args[0], args.slice(1), { stdio: 'inherit', env });
    if (result.status !== 0) fail(`"${args.join(' ')}" failed (exit ${result.status}).`);
  }
}

function lockHash() {
  return createHash('sha256')
    .update(readFileSync(join(root, 'package-lock.json')))
    .digest('hex');
}

function ensureNpmPackages() {
  const marker = join(root, 'node_modules', '.skyledger-lock-hash');
  const wanted = lockHash();
  if (existsSync(marker) && readFileSync(marker, 'utf8') === wanted) return;
  // A fresh clone gets exactly the lock (npm ci); an existing tree is brought in step
  // without being deleted first.
  const args = existsSync(join(root, 'node_modules')) ? ['install'] : ['ci'];
  console.info(`Installing npm packages (npm ${args[0]})...`);
  const result = spawnSync('npm', [...args, '--no-audit', '--no-fund'], {
    cwd: root,
    stdio: 'inherit',
  });
  if (result.status !== 0) fail(`"npm ${args[0]}" failed.`);
  writeFileSync(marker, wanted);
}

checkNode();
const commands = {
  start: [systemNeeds.mariadb],
  test: [systemNeeds.mariadb, systemNeeds.chromium],
  'test:faults': [systemNeeds.mariadb],
  bench: [systemNeeds.mariadb],
  'bench:quick': [systemNeeds.mariadb],
  'db:start': [systemNeeds.mariadb],
  'db:stop': [],
  'db:status': [],
  'db:reset': [systemNeeds.mariadb],
  'demo:reset': [systemNeeds.mariadb],
  'db:backup': [systemNeeds.mariadb],
  'db:restore': [systemNeeds.mariadb],
};
if (!(command in commands))
  fail(`Unknown command "${command}". Known: ${Object.keys(commands).join(', ')}.`);
ensureSystemPackages(commands[command]);
ensureNpmPackages();

// The dev stack handles Ctrl-C itself (it stops what it started, in order); this process
// only waits for it.
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => {});
const child = spawn(
  process.execPath,
  [
    join(root, 'node_modules/tsx/dist/cli.mjs'),
    join(root, 'packages/devstack/src/cli.ts'),
    command,
    ...rest,
  ],
  { cwd: root, stdio: 'inherit' },
);
child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
