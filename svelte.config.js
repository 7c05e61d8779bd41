// Svelte compiler options for the app (plain Svelte 5 + Vite, no SvelteKit: see DEVELOPERS.md).
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';

export default {
  preprocess: vitePreprocess(),
  compilerOptions: { runes: true },
};
