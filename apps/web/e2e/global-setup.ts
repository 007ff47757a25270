import { startTestStack, type TestStack } from '@skyledger/devstack';
import { type TestProject } from 'vitest/node';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    mailApiUrl: string;
  }
}

let stack: TestStack | undefined;

export async function setup(project: TestProject): Promise<void> {
  stack = await startTestStack('browser');
  project.provide('baseUrl', stack.baseUrl);
  project.provide('mailApiUrl', stack.mailApiUrl);
}

export async function teardown(): Promise<void> {
  await stack?.stop();
}
