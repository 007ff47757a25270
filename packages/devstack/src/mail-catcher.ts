import { type ChildProcess } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { dataDir, repoRoot } from './paths.js';
import { isPortOpen, startService, StepFailedError, waitFor } from './processes.js';

/**
 * MailDev: an SMTP server on loopback that keeps every mail, with an inbox page and a
 * REST API (`/api/email`). It stands in for the newsroom's relay on one machine.
 */
export async function startMailCatcher(options: {
  smtpPort: number;
  webPort: number;
  mailDirectory?: string;
  quiet?: boolean;
}): Promise<ChildProcess> {
  for (const port of [options.smtpPort, options.webPort]) {
    if (await isPortOpen(port)) {
      throw new StepFailedError(
        `Port ${port} on 127.0.0.1 is taken; set SKYLEDGER_SMTP_PORT / SKYLEDGER_MAIL_UI_PORT to free ports.`,
      );
    }
  }
  const mailDirectory = options.mailDirectory ?? join(dataDir, 'maildev');
  mkdirSync(mailDirectory, { recursive: true });
  const child = startService(
    process.execPath,
    [
      join(repoRoot, 'node_modules/maildev/dist/bin/maildev.js'),
      '--ip',
      '127.0.0.1',
      '--web-ip',
      '127.0.0.1',
      '--smtp',
      String(options.smtpPort),
      '--web',
      String(options.webPort),
      '--mail-directory',
      mailDirectory,
    ],
    { stdio: options.quiet ? 'ignore' : ['ignore', 'ignore', 'inherit'] },
  );
  await waitFor(
    'the mail catcher',
    async () => (await isPortOpen(options.webPort)) && isPortOpen(options.smtpPort),
    {
      timeoutMs: 30_000,
    },
  );
  return child;
}
