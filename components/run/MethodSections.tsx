'use client';
import { get, useFormContext, useWatch } from 'react-hook-form';
import type { RunFileInput } from '../../solver/runFile/schema';
import { FieldShell, SectionCard, controlClass } from './FieldShell';
import { CI_SPACE_CHOICES, ciForSpace, type CiSpaceChoice } from './ciSettings';
import { OrbitalPicker } from './OrbitalPicker';

function errorText(errors: unknown, path: string): string | undefined {
  return (get(errors, path) as { message?: string } | undefined)?.message;
}

const number = { valueAsNumber: true } as const;
/** An optional whole number: an empty box leaves the field out of the run file. */
const optionalNumber = { setValueAs: (v: unknown) => (v === '' || v === null || v === undefined ? undefined : Number(v)) } as const;

/** Reference and basis-independent settings: which determinant the CI starts from. */
export function ReferenceSection() {
  const { control, formState, setValue } = useFormContext<RunFileInput>();
  const systemType = useWatch({ control, name: 'system.type' });
  const reference = useWatch({ control, name: 'reference' });
  const isModel = systemType !== 'molecule';
  return (
    <SectionCard title="Reference" testId="section-reference">
      <FieldShell
        label="Reference determinant"
        testId="reference"
        error={errorText(formState.errors, 'reference')}
        hint={
          isModel
            ? 'A model Hamiltonian can use its own orbitals as they are, or have an SCF first.'
            : 'RHF for closed shells, ROHF for open shells; UHF runs stop after the SCF.'
        }
      >
        {(c) => (
          // Controlled, because "no reference" is the absence of the field, not a value of it.
          <select
            {...c}
            className={controlClass(Boolean(c['aria-invalid']))}
            data-testid="reference"
            value={reference ?? ''}
            onChange={(e) =>
              setValue('reference', e.target.value === '' ? undefined : (e.target.value as RunFileInput['reference']), {
                shouldValidate: true,
                shouldDirty: true,
              })
            }
          >
            {isModel || reference === undefined ? <option value="">{isModel ? "the model's own orbitals" : 'by multiplicity (RHF or ROHF)'}</option> : null}
            <option value="RHF">RHF</option>
            <option value="ROHF">ROHF</option>
            <option value="UHF">UHF</option>
          </select>
        )}
      </FieldShell>
    </SectionCard>
  );
}

export function CiSpaceSection() {
  const { register, control, formState, setValue, getValues } = useFormContext<RunFileInput>();
  const ci = useWatch({ control, name: 'ci' });
  const space: CiSpaceChoice = ci?.space ?? 'none';
  const errors = formState.errors;
  const ciRootError = (get(errors, 'ci') as { message?: string } | undefined)?.message;
  return (
    <SectionCard title="CI space" testId="section-ci">
      <div className="grid gap-4 sm:grid-cols-3">
        <FieldShell label="Space" testId="ci-space" error={ciRootError ?? errorText(errors, 'ci.space')}>
          {(c) => (
            <select
              {...c}
              className={controlClass(Boolean(c['aria-invalid']))}
              data-testid="ci-space"
              value={space}
              onChange={(e) => setValue('ci', ciForSpace(e.target.value as CiSpaceChoice, getValues('ci')), { shouldValidate: true, shouldDirty: true })}
            >
              {CI_SPACE_CHOICES.map((choice) => (
                <option key={choice.id} value={choice.id}>
                  {choice.label}
                </option>
              ))}
            </select>
          )}
        </FieldShell>
        {space === 'CI' ? (
          <FieldShell label="Highest excitation level" testId="ci-level" error={errorText(errors, 'ci.excitationLevel')} hint="Spin-orbital excitations from the reference, α and β together.">
            {(c) => <input {...c} type="number" min={1} step={1} className={controlClass(Boolean(c['aria-invalid']))} data-testid="ci-level" {...register('ci.excitationLevel', number)} />}
          </FieldShell>
        ) : null}
        {space === 'CAS' ? (
          <>
            <FieldShell label="Active electrons" testId="cas-electrons" error={errorText(errors, 'ci.active.electrons') ?? errorText(errors, 'ci.active')}>
              {(c) => <input {...c} type="number" min={0} step={1} className={controlClass(Boolean(c['aria-invalid']))} data-testid="cas-electrons" {...register('ci.active.electrons', number)} />}
            </FieldShell>
            <FieldShell label="Active orbitals" testId="cas-orbitals" error={errorText(errors, 'ci.active.orbitals')} hint="The window next to the Fermi level.">
              {(c) => <input {...c} type="number" min={1} step={1} className={controlClass(Boolean(c['aria-invalid']))} data-testid="cas-orbitals" {...register('ci.active.orbitals', number)} />}
            </FieldShell>
          </>
        ) : null}
      </div>
      {ci ? (
        <div className="mt-2 grid gap-4 sm:grid-cols-3">
          <FieldShell label="Frozen core orbitals" testId="frozen-core" error={errorText(errors, 'ci.frozenCore')} hint="Lowest SCF orbitals kept doubly occupied.">
            {(c) => <input {...c} type="number" min={0} step={1} className={controlClass(Boolean(c['aria-invalid']))} data-testid="frozen-core" {...register('ci.frozenCore', number)} />}
          </FieldShell>
          <FieldShell label="Deleted virtual orbitals" testId="deleted-virtuals" error={errorText(errors, 'ci.deletedVirtuals')} hint="Highest SCF orbitals left out.">
            {(c) => <input {...c} type="number" min={0} step={1} className={controlClass(Boolean(c['aria-invalid']))} data-testid="deleted-virtuals" {...register('ci.deletedVirtuals', number)} />}
          </FieldShell>
          <FieldShell label="Eigensolver" testId="ci-method" error={errorText(errors, 'ci.method')} hint="Automatic: dense up to 400 determinants, Davidson above.">
            {(c) => (
              <select {...c} className={controlClass(Boolean(c['aria-invalid']))} data-testid="ci-method" {...register('ci.method')}>
                <option value="auto">automatic</option>
                <option value="dense">dense</option>
                <option value="davidson">Davidson</option>
              </select>
            )}
          </FieldShell>
        </div>
      ) : null}
      <OrbitalPicker />
    </SectionCard>
  );
}

export function RootsSection() {
  const { register, control, formState } = useFormContext<RunFileInput>();
  const ci = useWatch({ control, name: 'ci' });
  const errors = formState.errors;
  if (!ci) {
    return (
      <SectionCard title="Roots" testId="section-roots">
        <p className="text-sm text-ink-soft">An SCF-only run has one state: the reference.</p>
      </SectionCard>
    );
  }
  return (
    <SectionCard title="Roots" testId="section-roots">
      <div className="grid gap-4 sm:grid-cols-3">
        <FieldShell label="Number of roots" testId="roots" error={errorText(errors, 'ci.roots')} hint="Lowest states of the determinant space.">
          {(c) => <input {...c} type="number" min={1} max={50} step={1} className={controlClass(Boolean(c['aria-invalid']))} data-testid="roots" {...register('ci.roots', number)} />}
        </FieldShell>
        <FieldShell
          label="Target multiplicity"
          testId="target-multiplicity"
          error={errorText(errors, 'ci.targetMultiplicity')}
          hint="Optional: keep only roots of this 2S+1 (leave empty for every spin state)."
        >
          {(c) => (
            <input {...c} type="number" min={1} step={1} className={controlClass(Boolean(c['aria-invalid']))} data-testid="target-multiplicity" {...register('ci.targetMultiplicity', optionalNumber)} />
          )}
        </FieldShell>
      </div>
    </SectionCard>
  );
}
