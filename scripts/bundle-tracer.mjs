/**
 * Bundles the tracer (src/lib/trace/index.ts under a tree's root) into one ES module the way the page's
 * worker gets it: with Rolldown, Vite's own bundler, which keeps module-scope `const` as `const` — the
 * engine folds those typed arrays into the loop. (An esbuild bundle turns every module-scope declaration
 * into `var` and traced 30 % slower than the page's build: not a fair stand-in.)
 * Used by bench-bundled.mjs and bench-native.mjs.
 */
import { VERSION, rolldown } from 'rolldown';

/** The bundler's name and version, for the bench headers. */
export const BUNDLER = `rolldown ${VERSION}`;

/** Writes the tracer of the tree at `root` to `outfile` (an .mjs path). */
export async function bundleTracer(root, outfile) {
  // tsconfig: false — an older tree's tsconfig may point at generated files it does not have
  const build = await rolldown({ input: `${root}/src/lib/trace/index.ts`, platform: 'neutral', tsconfig: false, logLevel: 'warn' });
  await build.write({ file: outfile, format: 'esm' });
  await build.close();
}
