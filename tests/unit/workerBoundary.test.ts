import { describe, expect, it } from 'vitest';
import { existsSync, readFileSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import ts from 'typescript';

/**
 * The main thread never blocks because it never runs the solver: the page's code reaches the
 * engine only through the worker. This follows every runtime import (type-only imports are
 * erased by the compiler and cost nothing) from the browser-side folders and checks that none
 * arrives at the solver's computing stages. The worker itself is loaded with
 * `new Worker(new URL(...))`, which is not an import, so the engine lands in the worker's bundle only.
 */
const root = path.resolve(__dirname, '../..');
/** The stages that compute: integrals, SCF, transformation, CI and the pipeline that runs them. */
const ENGINE = ['solver/run', 'solver/ci', 'solver/scf', 'solver/integrals', 'solver/transform', 'solver/scan'].map((d) => path.join(root, d) + path.sep);

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return sourceFiles(full);
    return /\.(ts|tsx)$/.test(name) && !name.endsWith('.d.ts') ? [full] : [];
  });
}

/** Runtime module specifiers of one file: imports and re-exports that are not type-only. */
function runtimeImports(file: string): string[] {
  const source = ts.createSourceFile(file, readFileSync(file, 'utf8'), ts.ScriptTarget.Latest, false, file.endsWith('x') ? ts.ScriptKind.TSX : ts.ScriptKind.TS);
  const out: string[] = [];
  for (const statement of source.statements) {
    if (ts.isImportDeclaration(statement)) {
      const clause = statement.importClause;
      if (clause?.isTypeOnly) continue;
      const named = clause?.namedBindings;
      const onlyTypes = clause && !clause.name && named && ts.isNamedImports(named) && named.elements.length > 0 && named.elements.every((e) => e.isTypeOnly);
      if (!onlyTypes) out.push((statement.moduleSpecifier as ts.StringLiteral).text);
    } else if (ts.isExportDeclaration(statement) && statement.moduleSpecifier && !statement.isTypeOnly) {
      out.push((statement.moduleSpecifier as ts.StringLiteral).text);
    }
  }
  // Dynamic import('...') would also pull code onto the main thread.
  const visit = (node: ts.Node) => {
    if (ts.isCallExpression(node) && node.expression.kind === ts.SyntaxKind.ImportKeyword && node.arguments[0] && ts.isStringLiteral(node.arguments[0])) {
      out.push(node.arguments[0].text);
    }
    ts.forEachChild(node, visit);
  };
  visit(source);
  return out;
}

function resolveLocal(from: string, specifier: string): string | null {
  const base = specifier.startsWith('@/') ? path.join(root, specifier.slice(2)) : specifier.startsWith('.') ? path.resolve(path.dirname(from), specifier) : null;
  if (!base) return null; // a package from node_modules
  for (const candidate of [base, `${base}.ts`, `${base}.tsx`, path.join(base, 'index.ts'), path.join(base, 'index.tsx')]) {
    if (existsSync(candidate) && statSync(candidate).isFile()) return candidate;
  }
  return null;
}

/** Every chain of runtime imports from `entry` that ends inside the engine. */
function pathsIntoEngine(entry: string): string[][] {
  const found: string[][] = [];
  const seen = new Set<string>();
  const walk = (file: string, chain: string[]) => {
    if (seen.has(file)) return;
    seen.add(file);
    if (ENGINE.some((dir) => file.startsWith(dir))) {
      found.push([...chain, file].map((f) => path.relative(root, f)));
      return;
    }
    // Past the entry, a worker module is reached only as a Worker URL, never run on the page.
    if (chain.length > 0 && file.startsWith(path.join(root, 'workers') + path.sep)) return;
    for (const specifier of runtimeImports(file)) {
      const next = resolveLocal(file, specifier);
      if (next) walk(next, [...chain, file]);
    }
  };
  walk(entry, []);
  return found;
}

describe('the page reaches the solver only through its worker', () => {
  const clientFiles = sourceFiles(path.join(root, 'components')).filter((f) => /^\s*['"]use client['"]/.test(readFileSync(f, 'utf8')));

  it('finds the run page among the client components (the check is not vacuous)', () => {
    expect(clientFiles.map((f) => path.relative(root, f))).toContain(path.join('components', 'run', 'RunPage.tsx'));
  });

  it('no client component imports the computing stages at run time', () => {
    const offenders = clientFiles.flatMap(pathsIntoEngine).map((chain) => chain.join(' → '));
    expect(offenders).toEqual([]);
  });

  it('the same walk does find the engine from the worker (the check can fail)', () => {
    const fromWorker = pathsIntoEngine(path.join(root, 'workers', 'solver.worker.ts'));
    expect(fromWorker.some((chain) => chain[chain.length - 1].startsWith(path.join('solver', 'run')))).toBe(true);
  });

  it('the run hook starts a module worker on workers/solver.worker.ts', () => {
    const hook = readFileSync(path.join(root, 'components', 'run', 'useSolverWorker.ts'), 'utf8');
    expect(hook).toMatch(/new Worker\(\s*new URL\(\s*['"]\.\.\/\.\.\/workers\/solver\.worker\.ts['"]\s*,\s*import\.meta\.url\s*\)/);
  });
});
