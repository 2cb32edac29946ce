// @ts-check
import { defineConfig } from 'astro/config';
import node from '@astrojs/node';
import react from '@astrojs/react';
import mdx from '@astrojs/mdx';
import tailwindcss from '@tailwindcss/vite';
import remarkMath from 'remark-math';
import rehypeKatex from 'rehype-katex';

export default defineConfig({
  output: 'server',
  adapter: node({ mode: 'standalone' }),
  server: { port: 4321, host: 'localhost' },
  // Without allowed domains the server reads every request as addressed to "http://localhost", so
  // Astro's same-origin check refuses every multipart upload sent from the real address. An empty
  // pattern takes the Host the client used; a cross-site page still cannot make its Origin match.
  security: { checkOrigin: true, allowedDomains: [{}] },
  integrations: [react(), mdx()],
  markdown: {
    remarkPlugins: [remarkMath],
    rehypePlugins: [rehypeKatex],
  },
  vite: {
    plugins: [tailwindcss()],
    // better-sqlite3 is a native addon: load it from node_modules at run time, never bundle it.
    ssr: { external: ['better-sqlite3'] },
  },
});
