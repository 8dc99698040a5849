/// <reference types="vitest/config" />
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

// Relative base so the built app also works from a sub-path or a saved copy; workers as ES modules.
export default defineConfig({
  base: './',
  plugins: [react()],
  worker: { format: 'es' },
  server: { host: '127.0.0.1' },
  preview: { host: '127.0.0.1', port: 4173, strictPort: false },
  test: {
    include: [
      'tests/unit/**/*.test.ts',
      'tests/validation/**/*.test.ts',
      'tests/property/**/*.test.ts',
    ],
    environment: 'node',
    setupFiles: ['tests/setup/generatedData.ts'],
    testTimeout: 60_000,
  },
});
