import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    testTimeout: 30_000,
    // Hooks that check whole draft folders (test/tuning) outlast the default 10 s on our shared 2-core
    // machine when it is loaded; they get the time a test gets.
    hookTimeout: 30_000,
  },
});
