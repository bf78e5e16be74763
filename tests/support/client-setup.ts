import { afterEach, vi } from 'vitest';
import { cleanup, configure } from '@testing-library/react';
import { onlineManager } from '@tanstack/react-query';

// findBy… and waitFor give up after 5 s rather than Testing Library's 1 s: a passing test never waits longer, and a
// loaded two-core runner (the suites run side by side with a build) must not fail a test that is only slow.
configure({ asyncUtilTimeout: 5000 });

// After every client test: unmount what it rendered, put back stubbed globals (fetch), spies and real timers; the
// device's storage emptied (a client's saved plan) and its network back.
afterEach(() => {
  cleanup();
  localStorage.clear();
  onlineManager.setOnline(true);
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
  vi.useRealTimers();
});
