import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { dataDir } from './paths.js';

export interface LocalSecrets {
  dbPassword: string;
  jwtSecret: string;
}

const secretsFile = join(dataDir, 'secrets.json');

/**
 * The private instance's passwords, generated on first use and kept in the ignored
 * `.data/` folder (mode 600), so no secret is ever in the code or the repository.
 */
export function localSecrets(): LocalSecrets {
  if (existsSync(secretsFile)) return JSON.parse(readFileSync(secretsFile, 'utf8')) as LocalSecrets;
  mkdirSync(dataDir, { recursive: true });
  const secrets: LocalSecrets = {
    dbPassword: randomBytes(18).toString('base64url'),
    jwtSecret: randomBytes(48).toString('base64url'),
  };
  writeFileSync(secretsFile, JSON.stringify(secrets, null, 2), { mode: 0o600 });
  return secrets;
}
