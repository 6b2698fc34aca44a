import { describe, expect, it } from 'vitest';
import { runBuilderResolver, flattenErrors, normaliseFieldPath, withErrorAt } from '../../../components/run/runBuilderResolver';
import { presetById } from '../../../components/run/presets';
import { ciForSpace } from '../../../components/run/ciSettings';
import { runFileSchema, type RunFileInput } from '../../../solver/runFile/schema';

const options = { fields: {}, shouldUseNativeValidation: false } as Parameters<typeof runBuilderResolver>[2];

function h2(): RunFileInput {
  return JSON.parse(JSON.stringify(presetById('h2')!.runFile));
}

describe('run builder validation', () => {
  it('passes a valid run file through the schema, defaults filled in', async () => {
    const out = await runBuilderResolver(h2(), undefined, options);
    expect(out.errors).toEqual({});
    const values = out.values as Record<string, unknown>;
    expect(values.symmetry).toBe(true); // schema default
    expect((values.ci as { method: string }).method).toBe('auto'); // schema default
  });

  it('puts an impossible multiplicity beside the multiplicity field', async () => {
    const runFile = h2();
    (runFile.system as { multiplicity: number }).multiplicity = 2;
    (runFile as { reference?: string }).reference = 'ROHF';
    const out = await runBuilderResolver(runFile, undefined, options);
    const flat = flattenErrors(out.errors);
    expect(flat.find((e) => e.path === 'system.multiplicity')?.message).toContain('2 electrons cannot have multiplicity 2');
    expect(out.values).toEqual({});
  });

  it('keeps schema errors next to the parity error', async () => {
    const runFile = h2();
    (runFile.system as { multiplicity: number }).multiplicity = 2; // RHF with a doublet: schema error at reference
    const flat = flattenErrors((await runBuilderResolver(runFile, undefined, options)).errors);
    expect(flat.map((e) => e.path).sort()).toEqual(['reference', 'system.multiplicity']);
  });

  it('reports a CAS space without a window at ci.active', async () => {
    const runFile = h2();
    runFile.ci = { space: 'CAS' };
    const flat = flattenErrors((await runBuilderResolver(runFile, undefined, options)).errors);
    expect(flat.some((e) => e.path === 'ci.active')).toBe(true);
  });

  it('reports a non-number typed into a count (an empty number box) at its field', async () => {
    const runFile = h2();
    (runFile.ci as { roots: number }).roots = Number.NaN;
    const flat = flattenErrors((await runBuilderResolver(runFile, undefined, options)).errors);
    expect(flat.some((e) => e.path === 'ci.roots')).toBe(true);
  });
});

describe('switching CI space keeps the run file valid', () => {
  it.each(['CIS', 'CISD', 'CISDT', 'CISDTQ', 'FCI', 'CAS', 'CI', 'none'] as const)('to %s', (space) => {
    const runFile = h2();
    runFile.ci = { space: 'CI', excitationLevel: 3, frozenCore: 0, deletedVirtuals: 0, roots: 2, targetMultiplicity: 1 };
    runFile.ci = ciForSpace(space, runFile.ci);
    expect(runFileSchema.safeParse(runFile).success).toBe(true);
    if (space === 'none') expect(runFile.ci).toBeUndefined();
    else {
      expect(runFile.ci?.roots).toBe(2);
      expect(runFile.ci?.targetMultiplicity).toBe(1);
      expect(runFile.ci?.excitationLevel).toBe(space === 'CI' ? 3 : undefined);
      expect(runFile.ci?.active).toEqual(space === 'CAS' ? { electrons: 2, orbitals: 2 } : undefined);
    }
  });
});

describe('error paths', () => {
  it('reads solver field paths with brackets as form paths', () => {
    expect(normaliseFieldPath('system.atoms[2]')).toBe('system.atoms.2');
    expect(normaliseFieldPath('system.oneBody[1][0]')).toBe('system.oneBody.1.0');
    expect(normaliseFieldPath('ci.roots')).toBe('ci.roots');
  });

  it('nests an error at a dotted path without touching its siblings', () => {
    const errors = withErrorAt({ system: { charge: { type: 'x', message: 'a' } } }, 'system.multiplicity', { type: 'parity', message: 'b' });
    expect(flattenErrors(errors)).toEqual([
      { path: 'system.charge', message: 'a' },
      { path: 'system.multiplicity', message: 'b' },
    ]);
  });
});
