import { svelte } from '@sveltejs/vite-plugin-svelte';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  plugins: [svelte({ configFile: false, compilerOptions: { runes: true } })],
  test: {
    include: ['tests/**/*.test.ts'],
    environment: 'node',
    globalSetup: ['tests/global-setup.ts'],
    // A test that asserts nothing fails.
    expect: { requireAssertions: true },
    testTimeout: 60_000,
    hookTimeout: 120_000,
    // Two cores on the build machines: keep the pool small so timing-sensitive tests stay stable.
    maxWorkers: 2,
  },
});
