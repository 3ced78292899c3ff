// Before each test file: the environment loadEnv() reads, and one app per file closed at the end.
import { afterAll } from 'vitest';
import { closeTestApp } from '../fixtures/app.js';
import { testEnvVars } from '../fixtures/test-env.js';

Object.assign(process.env, testEnvVars);

afterAll(async () => {
  await closeTestApp();
});
