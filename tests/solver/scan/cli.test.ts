import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { BOHR_TO_ANGSTROM } from '../../../solver/constants';

const root = path.resolve(__dirname, '../../..');
const tsx = path.join(root, 'node_modules/.bin/tsx');
const cli = path.join(root, 'workers/cli.ts');
const dir = mkdtempSync(path.join(tmpdir(), 'ketbook-scan-cli-'));

function solve(file: string, ...flags: string[]) {
  const out = spawnSync(tsx, [cli, file, ...flags], { encoding: 'utf8', cwd: root });
  const lines = out.stdout.trim().split('\n');
  return { status: out.status, lines, json: JSON.parse(lines[lines.length - 1]), stderr: out.stderr };
}

describe('npm run -s solve -- scan.json', () => {
  it('prints one JSON document: points in the scan units, curves and constants in the order of methods', () => {
    const file = path.join(dir, 'h2-angstrom.json');
    const example = JSON.parse(readFileSync(path.join(__dirname, 'h2-scan.json'), 'utf8'));
    writeFileSync(
      file,
      JSON.stringify({
        ...example,
        scan: { coordinate: { type: 'distance', atoms: [0, 1], move: [1] }, from: 0.5, to: 1.1, step: 0.1, units: 'angstrom' },
        methods: [{ space: 'FCI' }, { reference: 'RHF' }],
      }),
    );
    const r = solve(file);
    expect(r.status).toBe(0);
    expect(r.lines).toHaveLength(1);
    expect(r.json.points).toEqual([0.5, 0.6, 0.7, 0.8, 0.9, 1.0, 1.1]);
    expect(r.json.curves.map((c: { method: { label: string }; root: number }) => [c.method.label, c.root])).toEqual([['FCI', 0], ['RHF', 0]]);
    expect(r.json.curves[0].energies).toHaveLength(7);
    expect(r.json.constants.map((c: { method: number }) => c.method)).toEqual([0, 1]);
    const fci = r.json.constants[0];
    // R_e in bohr whatever the scan's units: minimal-basis FCI H2 lies between 0.7 and 0.8 Å (common practice, no source).
    expect(fci.Re * BOHR_TO_ANGSTROM).toBeGreaterThan(0.7);
    expect(fci.Re * BOHR_TO_ANGSTROM).toBeLessThan(0.8);
    expect(fci.DeReference).toBe('fragments');
    expect(typeof fci.omegaE).toBe('number');
    expect(r.stderr).toMatch(/point 7\/7/);
  });

  it('refuses a bad scan with exit code 2 and a JSON error naming the field', () => {
    const file = path.join(dir, 'bad.json');
    const example = JSON.parse(readFileSync(path.join(__dirname, 'h2-scan.json'), 'utf8'));
    writeFileSync(file, JSON.stringify({ ...example, scan: { ...example.scan, step: -0.1 } }));
    const r = solve(file);
    expect(r.status).toBe(2);
    expect(r.json.error.code).toBe('bad-input');
    expect(r.json.error.field).toBe('scan.step');
  });

  it('--estimate sizes each method at the first point without computing the scan', () => {
    const r = solve(path.join(__dirname, 'h2-scan.json'), '--estimate');
    expect(r.status).toBe(0);
    expect(r.json.points).toBe(27);
    // Minimal-basis H2: C(2,1)² = 4 determinants in full CI (common practice, no source).
    expect(r.json.methods[3].estimate.determinants).toBe(4);
    expect(r.json.methods[0].estimate).toBeNull();
  });
});
