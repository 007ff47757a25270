import { newsroom } from '@skyledger/seeds-demo/newsroom';
import { join } from 'node:path';
import { apiDir, migrationArgs, startApi } from './api-server.js';
import { appEnv } from './app-env.js';
import { startMailCatcher } from './mail-catcher.js';
import * as mariadb from './mariadb.js';
import { repoRoot } from './paths.js';
import { ports } from './ports.js';
import { npmCommand, runStep, stopService } from './processes.js';

/**
 * `npm start`: the private MariaDB, migrations, the demo seed, a build of everything, the
 * mail catcher and the API serving the desk on http://127.0.0.1:3000. Ctrl-C stops what
 * this started, newest first.
 */
export async function startStack(): Promise<number> {
  const started: Array<{ name: string; stop: () => Promise<unknown> }> = [];
  let stopping: Promise<number> | undefined;
  const stopAll = (code: number) =>
    (stopping ??= (async () => {
      console.info('\nStopping Skyledger...');
      for (const service of started.reverse()) {
        await service
          .stop()
          .catch((error: unknown) => console.error(`stopping ${service.name}:`, error));
      }
      return code;
    })());
  const interrupted = new Promise<number>((resolve) => {
    for (const signal of ['SIGINT', 'SIGTERM'] as const)
      process.on(signal, () => resolve(stopAll(0)));
  });

  try {
    if (await mariadb.start()) started.push({ name: 'MariaDB', stop: () => mariadb.stop() });
    const env = appEnv({ port: ports.app, smtpPort: ports.smtp });

    runStep('Building the packages, the API and the desk', npmCommand, ['run', 'build']);
    runStep('Running database migrations', process.execPath, migrationArgs(), { env, cwd: apiDir });
    runStep('Seeding the demo newsroom', npmCommand, ['run', 'seed', '-w', 'seeds-demo'], { env });

    const mail = await startMailCatcher({ smtpPort: ports.smtp, webPort: ports.mailInbox });
    started.push({ name: 'the mail catcher', stop: () => stopService(mail, 'the mail catcher') });
    const api = await startApi(env, ports.app);
    started.push({ name: 'the API', stop: () => stopService(api, 'the API') });

    await printBanner();
    const apiExited = new Promise<number>((resolve) =>
      api.once('exit', (code) => {
        if (stopping) return;
        console.error(`The API stopped unexpectedly (exit ${code}).`);
        resolve(stopAll(1));
      }),
    );
    return await Promise.race([interrupted, apiExited]);
  } catch (error) {
    await stopAll(1);
    throw error;
  }
}

async function printBanner(): Promise<void> {
  // Imported here, not at the top: the dev stack starts before the first build, and the
  // contracts package is read from its build.
  const { roleLabels } = await import('@skyledger/contracts');
  const line = '─'.repeat(64);
  console.info(`
${line}
 Skyledger is running.

   Desk (sign in)   http://127.0.0.1:${ports.app}
   Reader pages     http://127.0.0.1:${ports.app}/explainers   (what the public sees, no sign-in)
   API docs         http://127.0.0.1:${ports.app}/api/docs
   Mail inbox       http://127.0.0.1:${ports.mailInbox}   (every mail the desk sends lands here)
   Database         MariaDB on 127.0.0.1:${mariadb.database.port} (data in ${join(repoRoot, '.data')})

 Demo sign-ins (invented people of the ${newsroom.outlet}), password: ${newsroom.password}
${newsroom.people.map((person) => `   ${roleLabels[person.role].padEnd(16)} ${person.email}`).join('\n')}

 Press Ctrl-C to stop.
${line}`);
}
