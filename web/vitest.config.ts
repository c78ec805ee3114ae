import react from '@vitejs/plugin-react';
import { defineConfig } from 'vitest/config';

/** Unit and component tests: jsdom, jest-dom matchers, a fake fetch (src/testing/fake-api.ts). */
export default defineConfig({
  plugins: [react()],
  test: {
    environment: 'jsdom',
    globals: true,
    include: ['src/**/*.test.{ts,tsx}'],
    setupFiles: ['src/testing/setup.ts'],
    // Fluent's Griffel styles are plain JS; CSS files (fonts) are not needed to test behaviour.
    css: false,
    testTimeout: 20_000,
    restoreMocks: true,
    unstubGlobals: true,
  },
});
