export { createFakeProcessorApp, startFakeProcessor } from './server.js';
export type { FakeProcessor, FakeProcessorOptions } from './server.js';
export { signatureHeader } from './webhooks.js';
export { testCards } from './hosted-page.js';
export type { FakeEvent } from './objects.js';
