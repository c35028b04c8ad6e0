import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';

// ESLint's import-x/no-cycle refuses cycles between files; this test refuses them between server
// modules (folders), where two modules that each reach into the other make a tangle no single file shows.
const MODULES_DIR = path.dirname(new URL(import.meta.url).pathname);

/** Runtime imports only: `import type` and `export type` vanish at build time and make no cycle. */
const RUNTIME_IMPORT = /^\s*(?:import|export)\s+(?!type\b)[^;]*?from\s+'\.\.\/([a-z-]+)\//gm;

function moduleGraph(): Map<string, Set<string>> {
  const graph = new Map<string, Set<string>>();
  for (const module of readdirSync(MODULES_DIR, { withFileTypes: true }).filter((d) => d.isDirectory())) {
    const uses = new Set<string>();
    const dir = path.join(MODULES_DIR, module.name);
    for (const file of readdirSync(dir, { recursive: true, encoding: 'utf8' })) {
      if (!file.endsWith('.ts') || file.endsWith('.test.ts')) continue;
      for (const match of readFileSync(path.join(dir, file), 'utf8').matchAll(RUNTIME_IMPORT)) {
        if (match[1] !== module.name) uses.add(match[1]!);
      }
    }
    graph.set(module.name, uses);
  }
  return graph;
}

/** Strongly connected groups of more than one module (Tarjan), each sorted, in a stable order. */
function cycles(graph: Map<string, Set<string>>): string[][] {
  let next = 0;
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const found: string[][] = [];
  const visit = (node: string) => {
    index.set(node, next);
    low.set(node, next++);
    stack.push(node);
    for (const to of graph.get(node) ?? []) {
      if (!index.has(to)) {
        visit(to);
        low.set(node, Math.min(low.get(node)!, low.get(to)!));
      } else if (stack.includes(to)) low.set(node, Math.min(low.get(node)!, index.get(to)!));
    }
    if (low.get(node) === index.get(node)) {
      const group: string[] = [];
      let member: string;
      do {
        member = stack.pop()!;
        group.push(member);
      } while (member !== node);
      if (group.length > 1) found.push(group.sort());
    }
  };
  for (const node of graph.keys()) if (!index.has(node)) visit(node);
  return found.sort((a, b) => a.join().localeCompare(b.join()));
}


describe('server module imports', () => {
  it('finds the modules and their imports (the walk itself works)', () => {
    const graph = moduleGraph();
    expect(graph.get('visits')).toContain('audit');
    expect(graph.get('presses')).toContain('customers');
  });

  it('form no cycle between modules', () => {
    // Closing a visit reaches attachments and reports through visits/visit-close-ports.ts (set by createApp).
    expect(cycles(moduleGraph())).toEqual([]);
  });

  it('would see a new cycle', () => {
    const graph = new Map([
      ['visits', new Set(['audit'])],
      ['audit', new Set(['users'])],
      ['users', new Set(['audit'])],
      ['sites', new Set(['customers'])],
      ['customers', new Set<string>()],
    ]);
    expect(cycles(graph)).toEqual([['audit', 'users']]);
  });
});
