import { existsSync } from 'node:fs';
import { join } from 'node:path';

/**
 * Loads apps/api/.env when there is one (for running the API or its tools by hand).
 * Variables already set win, so `npm start` and the tests stay in control.
 */
export function loadEnvFile(): void {
  const file = join(__dirname, '../../.env');
  if (existsSync(file)) process.loadEnvFile(file);
}
