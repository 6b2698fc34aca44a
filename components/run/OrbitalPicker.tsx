'use client';
import { useEffect, useRef, useState } from 'react';
import { get, useFormContext, useWatch } from 'react-hook-form';
import type { RunFileInput } from '../../solver/runFile/schema';
import type { RunResult } from '../../solver/run/result';
import { spawnSolverWorker, type SolverHandle } from './useSolverWorker';
import { casFromPicked, rasFromRoles, type PickerOrbital, type RasRole } from './orbitalRoles';
import { controlClass, FieldShell } from './FieldShell';

function errorText(errors: unknown, path: string): string | undefined {
  return (get(errors, path) as { message?: string } | undefined)?.message;
}

function orbitalsOf(result: RunResult): PickerOrbital[] {
  const scf = result.scf!;
  return scf.orbitalEnergies.alpha.map((energyHartree, index) => ({
    index,
    energyHartree,
    irrep: scf.orbitalIrreps?.[index] ?? null,
    occupation: (scf.occupations.alpha[index] ?? 0) + (scf.occupations.beta[index] ?? 0),
  }));
}

/**
 * The orbital picker: a quick SCF of the system as it stands (in a worker of its own), its
 * orbitals with energies, symmetry labels and occupations, and per orbital whether it is in the
 * CAS window and in which RAS space. Choices are written into the run file's `ci` fields, where
 * the schema checks them like any typed value.
 */
export function OrbitalPicker() {
  const { control, getValues, setValue, formState, register } = useFormContext<RunFileInput>();
  const ci = useWatch({ control, name: 'ci' });
  const systemType = useWatch({ control, name: 'system.type' });
  const [orbitals, setOrbitals] = useState<PickerOrbital[] | null>(null);
  const [state, setState] = useState<'idle' | 'running' | 'failed'>('idle');
  const [message, setMessage] = useState<string | null>(null);
  const [picked, setPicked] = useState<Set<number>>(new Set());
  const [roles, setRoles] = useState<Map<number, RasRole>>(new Map());
  const handle = useRef<SolverHandle | null>(null);
  useEffect(() => () => handle.current?.worker.terminate(), []);

  if (systemType !== 'molecule' || !ci) return null;
  const errors = formState.errors;

  const quickScf = async () => {
    handle.current?.worker.terminate();
    setState('running');
    setMessage(null);
    const current = getValues();
    const h = spawnSolverWorker((crash) => {
      setState('failed');
      setMessage(`The quick SCF stopped: ${crash}`);
    });
    handle.current = h;
    const outcome = await h.api.run({ ...current, ci: undefined, title: undefined });
    h.worker.terminate();
    if (handle.current !== h) return;
    handle.current = null;
    if (!outcome.ok || !outcome.value.scf) {
      setState('failed');
      setMessage(outcome.ok ? 'This system has no SCF orbitals.' : `Fix the system first: ${outcome.error.message}`);
      return;
    }
    const list = orbitalsOf(outcome.value);
    setOrbitals(list);
    const active = current.ci?.activeOrbitals ?? [];
    setPicked(new Set(active));
    const r = new Map<number, RasRole>();
    current.ci?.ras?.ras1?.forEach((p) => r.set(p, 'ras1'));
    current.ci?.ras?.ras3?.forEach((p) => r.set(p, 'ras3'));
    setRoles(r);
    setState('idle');
  };

  const toggle = (p: number) => {
    const next = new Set(picked);
    if (next.has(p)) next.delete(p);
    else next.add(p);
    setPicked(next);
  };

  const setRole = (p: number, role: RasRole) => {
    const next = new Map(roles);
    if (role === 'ras2') next.delete(p);
    else next.set(p, role);
    setRoles(next);
    if (ci.ras) setValue('ci.ras', rasFromRoles(next, ci.ras.maxHoles, ci.ras.maxParticles), { shouldValidate: true, shouldDirty: true });
  };

  const useWindow = () => {
    if (!orbitals) return;
    setValue('ci', casFromPicked(getValues('ci'), orbitals, [...picked]), { shouldValidate: true, shouldDirty: true });
  };

  const toggleRas = () => {
    if (ci.ras) setValue('ci.ras', undefined, { shouldValidate: true, shouldDirty: true });
    else setValue('ci.ras', rasFromRoles(roles, 1, 1), { shouldValidate: true, shouldDirty: true });
  };

  const rasError = errorText(errors, 'ci.ras.ras1') ?? errorText(errors, 'ci.ras.ras3') ?? errorText(errors, 'ci.ras');
  return (
    <div className="mt-4 rounded-lg border border-ket-100 bg-ket-50/30 p-3" data-testid="orbital-picker">
      <div className="flex flex-wrap items-center gap-3">
        <h4 className="text-sm font-semibold text-ink">Orbital picker</h4>
        <button
          type="button"
          onClick={() => void quickScf()}
          disabled={state === 'running'}
          className="rounded-md border border-ket-500 px-3 py-1 text-sm font-semibold text-ket-700 hover:bg-ket-50 disabled:opacity-60"
          data-testid="picker-scf"
        >
          {state === 'running' ? 'Running SCF…' : orbitals ? 'Refresh orbitals' : 'Show orbitals (quick SCF)'}
        </button>
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={Boolean(ci.ras)} onChange={toggleRas} data-testid="ras-enabled" />
          RAS limits
        </label>
      </div>
      {message ? (
        <p className="mt-2 text-sm text-caution-700" role="status" data-testid="picker-message">
          {message}
        </p>
      ) : null}
      {ci.ras ? (
        <div className="mt-2 grid gap-3 sm:grid-cols-2" data-testid="ras-limits">
          <FieldShell label="Most holes in ras1" testId="ras-max-holes" error={errorText(errors, 'ci.ras.maxHoles')} hint="0 keeps ras1 full.">
            {(c) => <input {...c} type="number" min={0} step={1} className={controlClass(Boolean(c['aria-invalid']))} data-testid="ras-max-holes" {...register('ci.ras.maxHoles', { valueAsNumber: true })} />}
          </FieldShell>
          <FieldShell label="Most electrons in ras3" testId="ras-max-particles" error={errorText(errors, 'ci.ras.maxParticles')} hint="0 keeps ras3 empty.">
            {(c) => <input {...c} type="number" min={0} step={1} className={controlClass(Boolean(c['aria-invalid']))} data-testid="ras-max-particles" {...register('ci.ras.maxParticles', { valueAsNumber: true })} />}
          </FieldShell>
          {rasError ? <p className="text-sm text-caution-700 sm:col-span-2" data-testid="ras-error">{rasError}</p> : null}
        </div>
      ) : null}
      {orbitals ? (
        <>
          <table className="mt-3 w-full text-sm" data-testid="picker-table">
            <thead>
              <tr className="text-left text-ink-soft">
                <th className="py-1">Orbital</th>
                <th>ε (Eh)</th>
                <th>Symmetry</th>
                <th>Electrons</th>
                <th>In the CAS window</th>
                {ci.ras ? <th>RAS space</th> : null}
              </tr>
            </thead>
            <tbody className="font-mono">
              {orbitals.map((o) => (
                <tr key={o.index} data-testid="picker-row" className={o.occupation > 0 ? 'bg-ket-50/60' : ''}>
                  <td className="py-0.5">{o.index}</td>
                  <td>{o.energyHartree.toFixed(6)}</td>
                  <td className="font-sans">{o.irrep ?? '—'}</td>
                  <td>{o.occupation}</td>
                  <td>
                    <input type="checkbox" checked={picked.has(o.index)} onChange={() => toggle(o.index)} aria-label={`orbital ${o.index} in the window`} data-testid={`pick-${o.index}`} />
                  </td>
                  {ci.ras ? (
                    <td>
                      <select value={roles.get(o.index) ?? 'ras2'} onChange={(e) => setRole(o.index, e.target.value as RasRole)} className="rounded border px-1 text-xs" data-testid={`ras-role-${o.index}`}>
                        <option value="ras1">ras1 (limited holes)</option>
                        <option value="ras2">ras2 (free)</option>
                        <option value="ras3">ras3 (limited electrons)</option>
                      </select>
                    </td>
                  ) : null}
                </tr>
              ))}
            </tbody>
          </table>
          <div className="mt-2 flex items-center gap-3">
            <button
              type="button"
              onClick={useWindow}
              disabled={picked.size === 0}
              className="rounded-md bg-ket-600 px-3 py-1 text-sm font-semibold text-white hover:bg-ket-700 disabled:opacity-50"
              data-testid="picker-use-window"
            >
              Use the ticked orbitals as the CAS window
            </button>
            <span className="text-xs text-ink-soft">Orbitals left out below the window stay doubly occupied; those above stay empty.</span>
          </div>
          {errorText(errors, 'ci.activeOrbitals') ? <p className="mt-1 text-sm text-caution-700">{errorText(errors, 'ci.activeOrbitals')}</p> : null}
        </>
      ) : null}
    </div>
  );
}
