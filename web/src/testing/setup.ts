// IndexedDB in jsdom (the batch log keeps entries on the device before sending them).
import 'fake-indexeddb/auto';
import '@testing-library/jest-dom/vitest';
import { cleanup, configure } from '@testing-library/react';
import { afterEach, beforeEach } from 'vitest';
import { createI18n } from '../lib/i18n/create-i18n.js';

// Lazy routes load their chunk on first render; on a busy 2-core CI machine that can take longer
// than Testing Library's default 1 s for findBy* queries.
configure({ asyncUtilTimeout: 5000 });

// jsdom has no layout, so no ResizeObserver; Fluent's MessageBar and positioning construct one.
class NoLayoutResizeObserver {
  observe(): void {}
  unobserve(): void {}
  disconnect(): void {}
}
globalThis.ResizeObserver ??= NoLayoutResizeObserver as unknown as typeof ResizeObserver;

beforeEach(() => {
  window.localStorage.clear();
  // Components rendered on their own (without AppProviders) read the global instance: English.
  createI18n('en');
});

afterEach(() => {
  cleanup();
});
