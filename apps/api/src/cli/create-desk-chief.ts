import 'reflect-metadata';
import { randomBytes } from 'node:crypto';
import { parseArgs } from 'node:util';
import { isEmail } from 'class-validator';
import { UsersService } from '../users/users.service';
import { createCliContext } from './cli-context';

/**
 * `npm run create-desk-chief -w apps/api -- --email chief@example.org --name "Ada Example"`
 * makes the first desk chief of a new desk. Without --password a strong one is made up
 * and printed once.
 */
async function main(): Promise<void> {
  const { values } = parseArgs({
    options: { email: { type: 'string' }, name: { type: 'string' }, password: { type: 'string' } },
  });
  if (!values.email || !values.name) {
    throw new Error(
      'Usage: npm run create-desk-chief -w apps/api -- --email <e-mail> --name "<display name>" [--password <password>]',
    );
  }
  if (!isEmail(values.email)) throw new Error('--email must be an e-mail address');
  const password = values.password ?? randomBytes(15).toString('base64url');
  if (password.length < 12) throw new Error('--password must be at least 12 characters');
  const context = await createCliContext();
  try {
    const user = await context
      .get(UsersService)
      .createDeskChief({ email: values.email, displayName: values.name, password });
    console.info(`Desk chief ready: ${user.email} (${user.displayName}).`);
    if (!values.password) console.info(`Password (shown once): ${password}`);
  } finally {
    await context.close();
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
