'use client';
import { useState } from 'react';
import { get, useFormContext, useWatch } from 'react-hook-form';
import type { RunFileInput } from '../../solver/runFile/schema';
import { FieldShell, SectionCard, controlClass } from './FieldShell';
import { RUN_PRESETS } from './presets';
import { systemParity } from './electronParity';
import { flattenErrors } from './runBuilderResolver';
import { basisFromJson } from './basisUpload';

export type SystemSource = 'starter' | 'xyz' | 'hubbard' | 'integrals';

const SOURCES: { id: SystemSource; label: string }[] = [
  { id: 'starter', label: 'Starter systems' },
  { id: 'xyz', label: 'XYZ geometry' },
  { id: 'hubbard', label: 'Hubbard lattice' },
  { id: 'integrals', label: 'Integral file' },
];

export interface SystemSectionProps {
  source: SystemSource;
  onSourceChange: (source: SystemSource) => void;
  presetId: string;
  onPresetChange: (id: string) => void;
  xyzText: string;
  xyzError: string | null;
  onXyzText: (text: string) => void;
  integralsError: string | null;
  integralsName: string | null;
  onIntegralsFile: (file: File) => void;
}

function errorText(errors: unknown, path: string): string | undefined {
  const e = get(errors, path) as { message?: string } | undefined;
  return e?.message;
}

/** The first message anywhere under `path` (e.g. one atom's bad coordinate under system.atoms). */
function firstErrorUnder(errors: unknown, path: string): string | undefined {
  return flattenErrors(get(errors, path))[0]?.message;
}

const number = { valueAsNumber: true } as const;
const STO_CHOICES = ['STO-2G', 'STO-3G', 'STO-4G', 'STO-5G', 'STO-6G'];

/** The basis: a built-in STO-nG set, or a set read from a JSON file in Ketbook's custom or even-tempered layout. */
function BasisField() {
  const { control, formState, setValue } = useFormContext<RunFileInput>();
  const basis = useWatch({ control, name: 'system.basis' as 'system' }) as unknown;
  const [fileError, setFileError] = useState<string | null>(null);
  const uploaded = basis !== null && typeof basis === 'object';
  const name = uploaded ? ((basis as { name?: string }).name ?? `${(basis as { type: string }).type} set`) : null;
  const schemaError = firstErrorUnder(formState.errors, 'system.basis');
  return (
    <>
      <FieldShell label="Basis" testId="basis" error={uploaded ? undefined : schemaError}>
        {(c) => (
          <select
            {...c}
            className={controlClass(Boolean(c['aria-invalid']))}
            data-testid="basis"
            value={uploaded ? 'uploaded' : String(basis ?? 'STO-3G')}
            onChange={(e) => {
              if (e.target.value === 'uploaded') return;
              setFileError(null);
              setValue('system.basis' as 'system', e.target.value as never, { shouldValidate: true, shouldDirty: true });
            }}
          >
            {STO_CHOICES.map((b) => (
              <option key={b} value={b}>
                {b}
              </option>
            ))}
            {uploaded ? <option value="uploaded">{name} (from file)</option> : null}
          </select>
        )}
      </FieldShell>
      <FieldShell
        label="…or read a basis-set file (JSON)"
        testId="basis-file"
        error={fileError ?? (uploaded ? schemaError : undefined)}
        hint="Ketbook's custom layout (contracted shells per element) or an even-tempered set; see the contributor guide."
        className="sm:col-span-3"
      >
        {(c) => (
          <input
            {...c}
            type="file"
            accept=".json,application/json"
            className="mt-1 block text-sm"
            data-testid="basis-file"
            onChange={async (e) => {
              const file = e.target.files?.[0];
              if (!file) return;
              const read = basisFromJson(await file.text());
              if ('error' in read) {
                setFileError(read.error);
                return;
              }
              setFileError(null);
              setValue('system.basis' as 'system', read.basis as never, { shouldValidate: true, shouldDirty: true });
            }}
          />
        )}
      </FieldShell>
    </>
  );
}

export function SystemSection(props: SystemSectionProps) {
  const { register, control, formState } = useFormContext<RunFileInput>();
  const errors = formState.errors;
  const system = useWatch({ control, name: 'system' });
  const parity = systemParity(system);
  const parityHint = parity ? (
    <span className={parity.ok ? 'text-ket-700' : 'text-caution-700'} data-testid="parity" data-ok={parity.ok}>
      {parity.message}
    </span>
  ) : null;
  const multiplicityError = errorText(errors, 'system.multiplicity');

  return (
    <SectionCard title="System" testId="section-system">
      <div role="tablist" aria-label="Where the system comes from" className="mb-4 flex flex-wrap gap-2">
        {SOURCES.map((s) => (
          <button
            key={s.id}
            type="button"
            role="tab"
            aria-selected={props.source === s.id}
            data-testid={`source-${s.id}`}
            onClick={() => props.onSourceChange(s.id)}
            className={
              'rounded-full px-3 py-1 text-sm font-semibold ' +
              (props.source === s.id ? 'bg-ket-600 text-white' : 'border border-ket-500/50 text-ket-700 hover:bg-ket-50')
            }
          >
            {s.label}
          </button>
        ))}
      </div>

      {props.source === 'starter' ? (
        <FieldShell label="Starter system" testId="preset" hint={RUN_PRESETS.find((p) => p.id === props.presetId)?.description}>
          {(control) => (
            <select {...control} className={controlClass(false)} value={props.presetId} onChange={(e) => props.onPresetChange(e.target.value)} data-testid="preset">
              {RUN_PRESETS.map((p) => (
                <option key={p.id} value={p.id}>
                  {p.label}
                </option>
              ))}
            </select>
          )}
        </FieldShell>
      ) : null}

      {props.source === 'xyz' ? (
        <div className="grid gap-3">
          <FieldShell
            label="XYZ geometry (ångström)"
            testId="xyz"
            error={props.xyzError ?? undefined}
            hint="The atom count line, a comment line, then one “symbol x y z” line per atom. A bare list of atom lines works too."
          >
            {(control) => (
              <textarea
                {...control}
                rows={6}
                spellCheck={false}
                className={`${controlClass(Boolean(props.xyzError))} font-mono`}
                value={props.xyzText}
                onChange={(e) => props.onXyzText(e.target.value)}
                data-testid="xyz"
              />
            )}
          </FieldShell>
          <FieldShell label="…or read an .xyz file" testId="xyz-file">
            {(control) => (
              <input
                {...control}
                type="file"
                accept=".xyz,text/plain"
                className="mt-1 block text-sm"
                data-testid="xyz-file"
                onChange={(e) => {
                  const file = e.target.files?.[0];
                  if (file) void file.text().then(props.onXyzText);
                }}
              />
            )}
          </FieldShell>
        </div>
      ) : null}

      {system?.type === 'molecule' && (props.source === 'starter' || props.source === 'xyz') ? (
        <>
          <AtomsTable atoms={system.atoms as unknown[][]} units={system.units} error={firstErrorUnder(errors, 'system.atoms')} zeta={system.zeta} />
          <div className="mt-3 grid gap-4 sm:grid-cols-3">
            <FieldShell label="Charge" testId="charge" error={errorText(errors, 'system.charge')}>
              {(c) => <input {...c} type="number" step={1} className={controlClass(Boolean(c['aria-invalid']))} data-testid="charge" {...register('system.charge', number)} />}
            </FieldShell>
            <FieldShell label="Multiplicity (2S+1)" testId="multiplicity" error={multiplicityError} hint={multiplicityError ? undefined : parityHint}>
              {(c) => (
                <input {...c} type="number" step={1} min={1} className={controlClass(Boolean(c['aria-invalid']))} data-testid="multiplicity" {...register('system.multiplicity', number)} />
              )}
            </FieldShell>
            <BasisField />
          </div>
        </>
      ) : null}

      {system?.type === 'hubbard' && props.source === 'hubbard' ? (
        <div className="grid gap-4 sm:grid-cols-3">
          <FieldShell label="Sites" testId="hubbard-sites" error={errorText(errors, 'system.sites')}>
            {(c) => <input {...c} type="number" step={1} min={2} className={controlClass(Boolean(c['aria-invalid']))} data-testid="hubbard-sites" {...register('system.sites', number)} />}
          </FieldShell>
          <FieldShell label="Hopping t" testId="hubbard-t" error={errorText(errors, 'system.t')}>
            {(c) => <input {...c} type="number" step="any" className={controlClass(Boolean(c['aria-invalid']))} data-testid="hubbard-t" {...register('system.t', number)} />}
          </FieldShell>
          <FieldShell label="On-site repulsion U" testId="hubbard-u" error={errorText(errors, 'system.U')}>
            {(c) => <input {...c} type="number" step="any" className={controlClass(Boolean(c['aria-invalid']))} data-testid="hubbard-u" {...register('system.U', number)} />}
          </FieldShell>
          <FieldShell label="Electrons" testId="hubbard-electrons" error={errorText(errors, 'system.electrons')}>
            {(c) => <input {...c} type="number" step={1} min={1} className={controlClass(Boolean(c['aria-invalid']))} data-testid="hubbard-electrons" {...register('system.electrons', number)} />}
          </FieldShell>
          <FieldShell label="Multiplicity (2S+1)" testId="multiplicity" error={multiplicityError} hint={multiplicityError ? undefined : parityHint}>
            {(c) => <input {...c} type="number" step={1} min={1} className={controlClass(Boolean(c['aria-invalid']))} data-testid="multiplicity" {...register('system.multiplicity', number)} />}
          </FieldShell>
          <FieldShell label="Ring" testId="hubbard-periodic" error={errorText(errors, 'system.periodic')} hint="Join the last site to the first.">
            {(c) => <input {...c} type="checkbox" className="mt-2 h-4 w-4" data-testid="hubbard-periodic" {...register('system.periodic')} />}
          </FieldShell>
          <p className="text-xs text-ink-soft sm:col-span-3">Energies of a Hubbard run are in units of t.</p>
        </div>
      ) : null}

      {props.source === 'integrals' ? (
        <div className="grid gap-4">
          <FieldShell
            label="Integral file (JSON, Ketbook's integral layout)"
            testId="integrals-file"
            error={props.integralsError ?? errorText(errors, 'system.oneBody') ?? errorText(errors, 'system.twoBody') ?? firstErrorUnder(errors, 'system.overlap')}
            hint="An object with type “integrals”, orbitals, electrons, multiplicity, coreEnergy, oneBody (n×n) and twoBody ([p, q, r, s, (pq|rs)], 0-based, chemists' notation), optionally overlap (n×n, for basis functions that are not orthonormal) — or a whole run file holding one."
          >
            {(c) => (
              <input
                {...c}
                type="file"
                accept=".json,application/json"
                className="mt-1 block text-sm"
                data-testid="integrals-file"
                onChange={(e) => {
                  const file = e.target.files?.[0];
                  if (file) props.onIntegralsFile(file);
                }}
              />
            )}
          </FieldShell>
          {system?.type === 'integrals' ? (
            <div className="grid gap-4 sm:grid-cols-3">
              <p className="text-sm text-ink sm:col-span-3" data-testid="integrals-summary">
                {props.integralsName ? `${props.integralsName}: ` : ''}
                {system.orbitals} orbitals, {system.twoBody.length.toLocaleString('en-US')} two-electron entries, core energy {Number(system.coreEnergy ?? 0).toFixed(10)}.
              </p>
              <FieldShell label="Electrons" testId="integrals-electrons" error={errorText(errors, 'system.electrons')}>
                {(c) => <input {...c} type="number" step={1} min={1} className={controlClass(Boolean(c['aria-invalid']))} data-testid="integrals-electrons" {...register('system.electrons', number)} />}
              </FieldShell>
              <FieldShell label="Multiplicity (2S+1)" testId="multiplicity" error={multiplicityError} hint={multiplicityError ? undefined : parityHint}>
                {(c) => <input {...c} type="number" step={1} min={1} className={controlClass(Boolean(c['aria-invalid']))} data-testid="multiplicity" {...register('system.multiplicity', number)} />}
              </FieldShell>
            </div>
          ) : null}
        </div>
      ) : null}
    </SectionCard>
  );
}

function AtomsTable({ atoms, units, error, zeta }: { atoms: unknown[][]; units: 'bohr' | 'angstrom'; error?: string; zeta?: unknown }) {
  const unitLabel = units === 'bohr' ? 'bohr' : 'Å';
  return (
    <div className="mt-3">
      <table className="w-full text-left font-mono text-xs" data-testid="atoms-table">
        <caption className="mb-1 text-left font-sans text-sm font-semibold text-ink">
          Atoms ({atoms.length}), coordinates in {unitLabel}
        </caption>
        <thead className="text-ink-soft">
          <tr>
            <th className="py-1 pr-2 font-semibold">#</th>
            <th className="py-1 pr-2 font-semibold">element</th>
            <th className="py-1 pr-2 text-right font-semibold">x</th>
            <th className="py-1 pr-2 text-right font-semibold">y</th>
            <th className="py-1 pr-2 text-right font-semibold">z</th>
          </tr>
        </thead>
        <tbody>
          {atoms.slice(0, 60).map((atom, i) => (
            <tr key={i} className="border-t border-ink-soft/10">
              <td className="py-0.5 pr-2 text-ink-soft">{i + 1}</td>
              <td className="py-0.5 pr-2">
                {String(atom[0])}
                {(atom[4] as { ghost?: boolean } | undefined)?.ghost ? ' (ghost)' : ''}
              </td>
              {[1, 2, 3].map((k) => (
                <td key={k} className="py-0.5 pr-2 text-right">
                  {typeof atom[k] === 'number' ? (atom[k] as number).toFixed(6) : '—'}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      {zeta && typeof zeta === 'object' ? (
        <p className="mt-1 text-xs text-ink-soft" data-testid="zeta-note">
          Slater exponents:{' '}
          {Object.entries(zeta as Record<string, unknown>)
            .map(([el, v]) => `ζ(${el}) = ${typeof v === 'number' ? v : JSON.stringify(v)}`)
            .join(', ')}
        </p>
      ) : null}
      <p aria-live="polite" className="mt-1 min-h-4 text-sm text-caution-700" data-testid="atoms-error">
        {error ?? ''}
      </p>
    </div>
  );
}
