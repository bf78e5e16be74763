import { afterEach, vi } from 'vitest';
import { cleanup } from '@testing-library/react';

// After every client test: unmount what it rendered, put back stubbed globals (fetch), spies and real timers.
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
  vi.useRealTimers();
});
