import '@testing-library/jest-dom/vitest';
import { cleanup } from '@testing-library/react';
import { afterEach } from 'vitest';
import { sessionExpiry } from '../../src/lib/session-expiry';

afterEach(() => {
  cleanup();
  // Drafts on the device and an ended session belong to one test only.
  localStorage.clear();
  sessionExpiry.abandon();
});
