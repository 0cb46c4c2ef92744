/**
 * `npm run solve` after a production-only install (`npm ci --omit=dev`): the script's runner
 * (tsx) and every package the command line reaches through its imports must be runtime
 * dependencies, not development ones. The import graph is read from the source files.
 */
import { readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

const pkg = JSON.parse(readFileSync('package.json', 'utf8')) as {
  scripts: Record<string, string>;
  dependencies: Record<string, string>;
  devDependencies: Record<string, string>;
};

/** Every module specifier imported (statically or dynamically) from the file and its relatives. */
function importGraph(entry: string): { files: Set<string>; packages: Set<string> } {
  const files = new Set<string>();
  const packages = new Set<string>();
  const visit = (file: string) => {
    if (files.has(file)) return;
    files.add(file);
    const source = readFileSync(file, 'utf8');
    const specifiers = source.matchAll(/(?:from\s+|import\s*\(\s*|import\s+)['"]([^'"]+)['"]/g);
    for (const [, spec] of specifiers) {
      if (spec.startsWith('.')) visit(resolve(dirname(file), spec));
      else if (!spec.startsWith('node:'))
        packages.add(
          spec
            .split('/')
            .slice(0, spec.startsWith('@') ? 2 : 1)
            .join('/'),
        );
    }
  };
  visit(resolve(entry));
  return { files, packages };
}

describe('the command line after a production-only install', () => {
  it('runs through a runner that is a runtime dependency', () => {
    const runner = pkg.scripts.solve.split(/\s+/)[0];
    expect(runner).toBe('tsx');
    expect(pkg.dependencies).toHaveProperty('tsx');
    expect(pkg.devDependencies).not.toHaveProperty('tsx');
  });

  it('imports only Node built-ins, its own files and runtime dependencies', () => {
    const { files, packages } = importGraph('src/cli/main.ts');
    expect(files.size).toBeGreaterThan(10);
    const missing = [...packages].filter((name) => !(name in pkg.dependencies));
    expect(missing).toEqual([]);
  });
});
