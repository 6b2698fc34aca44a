import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

const root = path.resolve(__dirname, '../../..');
const tsx = path.join(root, 'node_modules/.bin/tsx');
const cli = path.join(root, 'workers/cli.ts');
const dir = mkdtempSync(path.join(tmpdir(), 'ketbook-cli-'));

function solve(content: string, ...flags: string[]) {
  const file = path.join(dir, `run-${Math.random().toString(36).slice(2)}.json`);
  writeFileSync(file, content);
  const out = spawnSync(tsx, [cli, file, ...flags], { encoding: 'utf8', cwd: root });
  const lines = out.stdout.trim().split('\n');
  return { status: out.status, lines, json: JSON.parse(lines[lines.length - 1]), stderr: out.stderr };
}

const h2 = (ci: object) =>
  JSON.stringify({
    format: 'ketbook-run/1',
    system: { type: 'molecule', units: 'angstrom', atoms: [['H', 0, 0, 0], ['H', 0, 0, 0.74]], charge: 0, multiplicity: 1, basis: 'STO-3G' },
    ci,
  });

describe('npm run -s solve', () => {
  it('prints exactly one JSON document with the result, progress on stderr', () => {
    const r = solve(h2({ space: 'FCI' }));
    expect(r.status).toBe(0);
    expect(r.lines).toHaveLength(1);
    expect(r.json.format).toBe('ketbook-result/1');
    // 0.74 Å = 1.39839 bohr (CODATA 2018 bohr radius); the FCI correlation of minimal-basis H2 near
    // 1.4 bohr is about −0.0206 Eh (Szabo & Ostlund (1996) ch. 4).
    expect(r.json.energies.correlation[0]).toBeCloseTo(-0.0206, 3);
    expect(r.stderr).toMatch(/SCF/);
  });

  it('exits 2 with a JSON error for malformed JSON and for an invalid run file', () => {
    const malformed = solve('{ "format": ');
    expect(malformed.status).toBe(2);
    expect(malformed.json.error.code).toBe('bad-input');
    const invalid = solve(h2({ space: 'CISD', excitationLevel: 4 }));
    expect(invalid.status).toBe(2);
    expect(invalid.json.error.field).toBe('ci.excitationLevel');
    const unknownElement = solve(h2({ space: 'FCI' }).replace('"H", 0, 0, 0.74', '"Xq", 0, 0, 0.74').replace('["H",0,0,0.74]', '["Xq",0,0,0.74]'));
    expect(unknownElement.status).toBe(2);
    expect(unknownElement.json.error.message).toMatch(/Xq/);
  });

  it('exits 3 above the memory budget, before computing', () => {
    const chain = Array.from({ length: 12 }, (_, i) => ['H', 0, 0, 1.8 * i]);
    const r = solve(
      JSON.stringify({
        format: 'ketbook-run/1',
        system: { type: 'molecule', units: 'bohr', atoms: chain, charge: 0, multiplicity: 1, basis: 'STO-3G' },
        ci: { space: 'FCI' },
        budget: { memoryBytes: 4 * 1024 * 1024 },
      }),
    );
    expect(r.status).toBe(3);
    expect(r.json.error.code).toBe('over-budget');
    expect(r.json.error.message).toMatch(/853,776/); // C(12,6)² determinants, common practice, no source
  });

  it('exits 4 when the CI does not converge in the allowed iterations', () => {
    const chain = Array.from({ length: 6 }, (_, i) => ['H', 0, 0, 1.8 * i]);
    const r = solve(
      JSON.stringify({
        format: 'ketbook-run/1',
        system: { type: 'molecule', units: 'bohr', atoms: chain, charge: 0, multiplicity: 1, basis: 'STO-3G' },
        ci: { space: 'FCI', method: 'davidson', convergence: { maxIterations: 2 } },
      }),
    );
    expect(r.status).toBe(4);
    expect(r.json.error.code).toBe('not-converged');
  });

  it('estimates without computing', () => {
    const r = solve(h2({ space: 'FCI' }), '--estimate');
    expect(r.status).toBe(0);
    expect(r.json.determinants).toBe(4);
    expect(r.json.withinBudget).toBe(true);
  });
});
