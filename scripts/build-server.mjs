// Bundles the server for `npm start`: server/index.ts and the CLI (migrate, prepare) become plain
// ESM in dist/server/, so production runs compiled code with Node alone (tsx stays for development
// and tests). npm packages stay external and load from node_modules; `@shared/` comes from tsconfig paths.
// esbuild is imported when a build runs, not when this file loads: `npm start` and `npm run cluster` import it before
// they have installed node_modules on a fresh clone.

/** Builds dist/server/{index,migrate,prepare,stand-ins}.mjs from the TypeScript sources. */
export async function buildServer() {
  const { build } = await import('esbuild');
  await build({
    entryPoints: {
      index: 'server/index.ts',
      migrate: 'server/cli/migrate.ts',
      prepare: 'server/cli/prepare.ts',
      'stand-ins': 'server/cli/stand-ins.ts',
    },
    outdir: 'dist/server',
    outExtension: { '.js': '.mjs' },
    bundle: true,
    platform: 'node',
    target: 'node20',
    format: 'esm',
    packages: 'external',
    sourcemap: 'linked',
    tsconfig: 'tsconfig.json',
    logLevel: 'warning',
  });
}

if (import.meta.url === `file://${process.argv[1]}`) await buildServer();
