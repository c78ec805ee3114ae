import '@testing-library/jest-dom/vitest';
import { cleanup } from '@testing-library/react';
import { afterEach, beforeEach } from 'vitest';

// jsdom has no layout, so no ResizeObserver; Fluent's MessageBar and positioning construct one.
class NoLayoutResizeObserver {
  observe(): void {}
  unobserve(): void {}
  disconnect(): void {}
}
globalThis.ResizeObserver ??= NoLayoutResizeObserver as unknown as typeof ResizeObserver;

beforeEach(() => {
  window.localStorage.clear();
});

afterEach(() => {
  cleanup();
});
