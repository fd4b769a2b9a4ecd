import { defineConfig } from 'vitest/config';
import { svelte } from '@sveltejs/vite-plugin-svelte';
import { svelteTesting } from '@testing-library/svelte/vite';

export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'node',
          environment: 'node',
          include: ['tests/unit/**/*.test.ts'],
          exclude: ['tests/unit/ui/**'],
          globalSetup: ['tests/unit/cli/buildCliSetup.ts'],
        },
      },
      {
        plugins: [svelte(), svelteTesting()],
        test: {
          name: 'ui',
          environment: 'jsdom',
          include: ['tests/unit/ui/**/*.test.ts'],
        },
      },
    ],
    reporters: ['default', ['json', { outputFile: 'reports/vitest.json' }]],
  },
});
