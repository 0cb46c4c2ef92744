/**
 * Build and dev-server settings for the Sagwright web app.
 * Plotly goes into its own chunk that loads only when the first plot is drawn,
 * so the shell and the numbers appear before the charting code arrives.
 */
import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

export default defineConfig({
  plugins: [react()],
  // plotly.js reads the Node-style `global`; in the browser that is globalThis.
  define: { global: 'globalThis' },
  resolve: {
    alias: [
      // Plotly's registry imports the map library's style sheet (10 KB gzip) whether or not a
      // map is ever drawn; the sag plot draws none.
      {
        find: /^maplibre-gl\/dist\/maplibre-gl\.css$/,
        replacement: fileURLToPath(new URL('./src/ui/plot/no-map-styles.css', import.meta.url)),
      },
    ],
  },
  server: { host: 'localhost', port: 5173, strictPort: true },
  preview: { host: 'localhost' },
  worker: { format: 'es' },
  build: {
    target: ['es2022', 'chrome111', 'edge111', 'firefox114', 'safari16.4'],
    sourcemap: true,
    // Plotly core + scatter is about 1 MB; it is lazy, so the warning is noise.
    chunkSizeWarningLimit: 1500,
    rolldownOptions: {
      output: {
        codeSplitting: {
          groups: [
            {
              name: 'plotly',
              test: /node_modules[\\/]plotly\.js[\\/]|plotlyLean\.ts/,
              priority: 2,
            },
            {
              name: 'react',
              test: /node_modules[\\/](react|react-dom|scheduler)[\\/]/,
              priority: 1,
            },
          ],
        },
      },
    },
  },
});
