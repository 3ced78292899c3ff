import { afterEach } from 'vitest';
import { cleanup } from '@testing-library/react';

// Each test renders into a fresh document.
afterEach(() => {
  cleanup();
});
