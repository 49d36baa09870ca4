import react from '@vitejs/plugin-react';
import { VitePWA } from 'vite-plugin-pwa';
import { defineConfig } from 'vitest/config';

const apiTarget = process.env.API_URL ?? 'http://localhost:8080';

export default defineConfig({
  plugins: [
    react(),
    VitePWA({
      registerType: 'prompt',
      injectRegister: false,
      includeAssets: ['icon.svg'],
      manifest: {
        name: 'Upstroke',
        short_name: 'Upstroke',
        description: 'Resuscitation recorder with EtCO2 debrief',
        theme_color: '#0b4f5c',
        background_color: '#f5f6f2',
        display: 'standalone',
        orientation: 'any',
        start_url: '/',
        icons: [
          { src: 'icon.svg', sizes: 'any', type: 'image/svg+xml', purpose: 'any' },
          { src: 'icon-192.png', sizes: '192x192', type: 'image/png' },
          { src: 'icon-512.png', sizes: '512x512', type: 'image/png' },
        ],
      },
      workbox: {
        globPatterns: ['**/*.{js,css,html,svg,png,woff,woff2,webmanifest}'],
        navigateFallback: '/index.html',
        navigateFallbackDenylist: [/^\/api\//],
        maximumFileSizeToCacheInBytes: 6 * 1024 * 1024,
      },
    }),
  ],
  resolve: { conditions: ['upstroke-source', 'module', 'browser', 'development|production'] },
  server: { port: 5173, proxy: { '/api': { target: apiTarget, ws: true } } },
  // The manifest lets `scripts/bundle-budget.mjs` find what each first screen loads.
  build: { outDir: 'dist', sourcemap: true, manifest: true, chunkSizeWarningLimit: 2500 },
  test: {
    name: 'web',
    environment: 'jsdom',
    include: ['src/**/*.test.{ts,tsx}'],
    setupFiles: ['src/testing/setup.ts'],
    // Component tests type and click through jsdom, which takes seconds on a busy machine:
    // generous limits, so only a hang fails (time itself is tested with fake timers).
    testTimeout: 60_000,
    hookTimeout: 60_000,
  },
});
