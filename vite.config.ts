/**
 * Build and dev-server settings for the Sagwright web app.
 * Plotly goes into its own chunk that loads only when the first plot is drawn,
 * so the shell and the numbers appear before the charting code arrives.
 * A service worker (vite-plugin-pwa, Workbox) precaches every built file, so once loaded the
 * app opens, solves and exports with no network; a new version waits until the person says.
 */
import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig, type Plugin } from 'vite';
import { VitePWA } from 'vite-plugin-pwa';
import {
  CONTENT_SECURITY_POLICY,
  CONTENT_SECURITY_POLICY_HEADER,
} from './contentSecurityPolicy.ts';

/** The policy as a <meta> tag in the built page (the dev server injects inline scripts). */
function contentSecurityPolicy(): Plugin {
  return {
    name: 'sagwright-content-security-policy',
    apply: 'build',
    transformIndexHtml: {
      order: 'post',
      handler: (html) =>
        html.replace(
          '<meta charset="UTF-8" />',
          `<meta charset="UTF-8" />\n    <meta http-equiv="Content-Security-Policy" content="${CONTENT_SECURITY_POLICY}" />`,
        ),
    },
  };
}

export default defineConfig({
  plugins: [
    react(),
    contentSecurityPolicy(),
    VitePWA({
      // The page registers the worker itself (src/ui/UpdateNotice.tsx): no inline script, so a
      // content security policy of script-src 'self' holds.
      injectRegister: false,
      registerType: 'prompt',
      manifest: {
        name: 'Sagwright',
        short_name: 'Sagwright',
        description: 'Size a tensioned wire span: tension, sag, clearance and fixing loads.',
        lang: 'en',
        start_url: '/',
        scope: '/',
        display: 'standalone',
        background_color: '#fbfaf7',
        theme_color: '#1f4f82',
        icons: [
          { src: '/icon-192.png', sizes: '192x192', type: 'image/png' },
          { src: '/icon-512.png', sizes: '512x512', type: 'image/png' },
          {
            src: '/icon-maskable-512.png',
            sizes: '512x512',
            type: 'image/png',
            purpose: 'maskable',
          },
          { src: '/favicon.svg', sizes: 'any', type: 'image/svg+xml' },
        ],
      },
      workbox: {
        // The app shell, the solver worker, Plotly and the report code: everything built, with
        // the report's Latin/Greek/Cyrillic font (Noto Sans, 0.63 MB a weight).
        globPatterns: ['**/*.{js,css,html,svg,png,webmanifest}', 'assets/NotoSans_*.ttf'],
        maximumFileSizeToCacheInBytes: 4 * 1024 * 1024,
        // The Japanese font (5.5 MB) is fetched only by a report that needs it, then kept.
        runtimeCaching: [
          {
            urlPattern: /\/assets\/NotoSansJP_[^/]*\.ttf$/,
            handler: 'CacheFirst',
            options: { cacheName: 'sagwright-report-fonts' },
          },
        ],
        navigateFallback: '/index.html',
        cleanupOutdatedCaches: true,
        sourcemap: false,
      },
    }),
  ],
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
  preview: {
    host: 'localhost',
    headers: { 'Content-Security-Policy': CONTENT_SECURITY_POLICY_HEADER },
  },
  worker: { format: 'es' },
  build: {
    target: ['es2022', 'chrome111', 'edge111', 'firefox114', 'safari16.4'],
    // No source maps in the shipped build (they would publish the source with it).
    sourcemap: false,
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
