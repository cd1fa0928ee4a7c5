/// <reference types="vitest/config" />
import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

// The API serves the built app from the same origin in production; in `vite dev`
// the proxy gives the same single origin, so cookies and CSRF work unchanged.
const apiTarget = process.env['VITE_API_PROXY'] ?? 'http://127.0.0.1:3000';

export default defineConfig({
  plugins: [react(), tailwindcss()],
  build: {
    // plotly.js (4.6 MB, 1.4 MB gzipped) is one lazily loaded chunk that only the plotting
    // pages fetch; every other chunk stays far below this.
    chunkSizeWarningLimit: 5000,
  },
  server: {
    proxy: { '/api': { target: apiTarget, changeOrigin: false } },
  },
  test: {
    environment: 'jsdom',
    include: ['src/**/*.test.{ts,tsx}'],
    setupFiles: ['src/test/setup.ts'],
    css: false,
  },
});
