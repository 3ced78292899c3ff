export { createFakeProcessorApp, startFakeProcessor } from './server.js';
export type { FakeProcessor } from './server.js';
