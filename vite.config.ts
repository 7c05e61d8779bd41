import { defineConfig } from 'vite';
import { svelte } from '@sveltejs/vite-plugin-svelte';

// The app is a static single page built into dist/; `npm start` serves it with `vite preview`.
export default defineConfig({
  root: 'src/app',
  publicDir: '../../static',
  base: './',
  plugins: [svelte()],
  build: { outDir: '../../dist', emptyOutDir: true, target: 'es2022' },
  worker: { format: 'es' },
  preview: { port: Number(process.env.PORT ?? 4173), strictPort: true, host: '127.0.0.1' },
  server: { port: Number(process.env.PORT ?? 5173) },
});
