import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

const fromRoot = (p: string) => fileURLToPath(new URL(p, import.meta.url));

export default defineConfig({
  plugins: [react(), tailwindcss()],
  resolve: {
    alias: {
      '@/': fromRoot('./src/'),
      '@shared/': fromRoot('./shared/'),
    },
  },
  server: {
    proxy: { '/api': 'http://127.0.0.1:3000', '/auth': 'http://127.0.0.1:3000', '/uploads': 'http://127.0.0.1:3000' },
  },
  build: {
    outDir: 'dist/client',
    emptyOutDir: true,
    sourcemap: false,
    // Nothing inlined as data: URLs, so the Content-Security-Policy can stay at 'self'.
    assetsInlineLimit: 0,
    chunkSizeWarningLimit: 600,
  },
});
