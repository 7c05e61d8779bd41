import { defineConfig } from 'vite';
import { svelte } from '@sveltejs/vite-plugin-svelte';
import { fileURLToPath } from 'node:url';

// The app is a static single page built into dist/; `npm start` serves it with `vite preview`.
export default defineConfig({
  root: 'src/app',
  publicDir: '../../static',
  base: './',
  // The app's root is src/app, so name the top-level svelte.config.js explicitly.
  plugins: [svelte({ configFile: fileURLToPath(new URL('./svelte.config.js', import.meta.url)) })],
  build: { outDir: '../../dist', emptyOutDir: true, target: 'es2022' },
  worker: { format: 'es' },
  preview: { port: Number(process.env.PORT ?? 4173), strictPort: true, host: '127.0.0.1' },
  server: { port: Number(process.env.PORT ?? 5173) },
});
