// Unit and reference tests: Node, no browser. Browser tests live in vitest.e2e.config.ts.
import { defineConfig } from 'vitest/config';
import preact from '@preact/preset-vite';

export default defineConfig({
  plugins: [preact()],
  test: {
    include: ['test/unit/**/*.test.{ts,tsx}', 'test/reference/**/*.test.{ts,tsx}'],
    environment: 'node',
    testTimeout: 30_000,
  },
});
