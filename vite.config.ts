import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { compression, defineAlgorithm } from 'vite-plugin-compression2';
import { constants } from 'node:zlib';

const fromRoot = (p: string) => fileURLToPath(new URL(p, import.meta.url));

export default defineConfig({
  plugins: [
    react(),
    tailwindcss(),
    // Precompressed at build time at the highest settings (Brotli quality 11, RFC 7932; gzip level 9), served as they
    // are by express-static-gzip; the compression middleware's on-the-fly Brotli runs at quality 4.
    compression({
      include: /\.(js|css|html|svg|json)$/,
      threshold: 1024,
      algorithms: [
        defineAlgorithm('brotliCompress', { params: { [constants.BROTLI_PARAM_QUALITY]: 11 } }),
        defineAlgorithm('gzip', { level: 9 }),
      ],
    }),
  ],
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
