// Bundles the API (and the workspace packages it imports, which ship as TypeScript) into
// apps/api/dist/server.js; registry packages stay external and load from node_modules.
import { build } from 'esbuild';

await build({
  entryPoints: ['apps/api/src/server.ts'],
  outfile: 'apps/api/dist/server.js',
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  sourcemap: true,
  logLevel: 'warning',
  plugins: [
    {
      name: 'external-registry-packages',
      setup(b) {
        b.onResolve({ filter: /^[^./]/ }, (args) =>
          args.path.startsWith('@keybed/') ? undefined : { path: args.path, external: true },
        );
      },
    },
  ],
});
