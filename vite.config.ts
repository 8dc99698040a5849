/// <reference types="vitest/config" />
import { defineConfig, type Plugin } from 'vite';
import react from '@vitejs/plugin-react';

/**
 * jsPDF loads html2canvas, canvg and DOMPurify on demand, only for its HTML and SVG-image
 * features, which Lamina does not use (the record is drawn with text and lines): they are left
 * out of the build. Should one ever be called, jsPDF rejects with "Could not load <name>: …".
 */
function withoutJsPdfOptionalDeps(): Plugin {
  const optional = new Set(['html2canvas', 'canvg', 'dompurify']);
  const prefix = '\0lamina-omitted:';
  return {
    name: 'lamina-without-jspdf-optional-deps',
    apply: 'build',
    enforce: 'pre',
    resolveId(id, importer) {
      return optional.has(id) && importer?.includes('/node_modules/jspdf/') ? prefix + id : null;
    },
    load(id) {
      if (!id.startsWith(prefix)) return null;
      const name = id.slice(prefix.length);
      return `throw new Error(${JSON.stringify(`${name} is not part of this build (jsPDF's optional HTML/SVG support)`)});`;
    },
  };
}

// Relative base so the built app also works from a sub-path or a saved copy; workers as ES modules.
export default defineConfig({
  base: './',
  plugins: [react(), withoutJsPdfOptionalDeps()],
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
