'use client';
import { memo, useCallback, useEffect, useState } from 'react';
import { FormProvider, useForm, useWatch } from 'react-hook-form';
import type { RunFile, RunFileInput } from '../../solver/runFile/schema';
import type { SolverWorkerHandle } from './useSolverWorker';
import { runBuilderResolver, flattenErrors, normaliseFieldPath } from './runBuilderResolver';
import { presetById, defaultHubbardRunFile, RUN_PRESETS } from './presets';
import { SystemSection, type SystemSource } from './SystemSection';
import { ReferenceSection, CiSpaceSection, RootsSection } from './MethodSections';
import { EstimatePanel } from './EstimatePanel';
import { useLiveEstimate } from './useLiveEstimate';
import { atomsFromXyz, atomsToXyz } from './xyzText';
import { readIntegralsUpload } from './integralsUpload';
import { FieldShell, controlClass } from './FieldShell';

const FIRST_PRESET = RUN_PRESETS[0];

function clone<T>(value: T): T {
  return JSON.parse(JSON.stringify(value)) as T;
}

/**
 * The run builder: one form over the run file itself, validated by the run-file schema
 * (plus the electron/multiplicity parity), with a live size estimate from the worker.
 * What Run sends is exactly the parsed run file, which is also what the download holds.
 */
/** What the form needs from the solver hook; progress and results are left out so they never re-render the form. */
export type RunBuilderSolver = Pick<SolverWorkerHandle, 'estimate' | 'ready' | 'status' | 'failure' | 'run' | 'cancel'>;

export const RunBuilder = memo(function RunBuilder({ solver }: { solver: RunBuilderSolver }) {
  const form = useForm<RunFileInput, unknown, RunFile>({
    resolver: runBuilderResolver,
    mode: 'onChange',
    defaultValues: clone(FIRST_PRESET.runFile),
  });
  const { handleSubmit, reset, control, getValues, setValue, setError, formState, register, trigger } = form;
  const [source, setSource] = useState<SystemSource>('starter');
  const [presetId, setPresetId] = useState(FIRST_PRESET.id);
  const [xyzText, setXyzText] = useState('');
  const [xyzError, setXyzError] = useState<string | null>(null);
  const [integralsError, setIntegralsError] = useState<string | null>(null);
  const [integralsName, setIntegralsName] = useState<string | null>(null);
  const [submitMessage, setSubmitMessage] = useState<string | null>(null);

  const values = useWatch({ control });
  const valuesKey = JSON.stringify(values);
  const blockedBy =
    source === 'xyz' && xyzError
      ? 'Fix the XYZ geometry to see the size of this run.'
      : source === 'integrals' && values.system?.type !== 'integrals'
        ? 'Load an integral file to see the size of this run.'
        : null;
  // Re-check the whole run file on every change: the schema's rules cross fields (RHF needs a
  // singlet, CAS needs a window), so one edit can make or clear an error elsewhere.
  useEffect(() => {
    void trigger();
  }, [valuesKey, trigger]);
  const estimate = useLiveEstimate(valuesKey, solver.estimate, solver.ready, blockedBy);
  const overBudget = estimate.kind === 'ok' && !estimate.estimate.withinBudget;
  // Bad input only the solver can see (atoms on top of each other, a window wider than the
  // basis) comes back from the estimate with the run-file field at fault.
  const estimateField = estimate.kind === 'error' && estimate.field ? normaliseFieldPath(estimate.field) : null;
  const running = solver.status === 'running';

  const loadRunFile = useCallback(
    (runFile: RunFileInput) => {
      reset(clone(runFile));
      setSubmitMessage(null);
    },
    [reset],
  );

  const onSourceChange = (next: SystemSource) => {
    setSource(next);
    setXyzError(null);
    setIntegralsError(null);
    const current = getValues();
    if (next === 'starter') loadRunFile(presetById(presetId)?.runFile ?? FIRST_PRESET.runFile);
    if (next === 'xyz') {
      const molecule = current.system.type === 'molecule' ? current : presetById(presetId)?.runFile ?? FIRST_PRESET.runFile;
      if (molecule !== current) loadRunFile(molecule);
      const system = molecule.system as Extract<RunFileInput['system'], { type: 'molecule' }>;
      setXyzText(atomsToXyz(system.atoms, system.units, molecule.title ?? ''));
    }
    if (next === 'hubbard') loadRunFile(defaultHubbardRunFile());
    if (next === 'integrals') setIntegralsName(null);
  };

  const onPresetChange = (id: string) => {
    setPresetId(id);
    const preset = presetById(id);
    if (preset) loadRunFile(preset.runFile);
  };

  const onXyzText = (text: string) => {
    setXyzText(text);
    const parsed = atomsFromXyz(text);
    if ('error' in parsed) {
      setXyzError(parsed.error);
      return;
    }
    setXyzError(null);
    setValue('system.units', 'angstrom', { shouldValidate: true });
    setValue('system.atoms', parsed.atoms, { shouldValidate: true, shouldDirty: true });
    if (parsed.comment) setValue('title', parsed.comment.slice(0, 200));
  };

  const onIntegralsFile = (file: File) => {
    void readIntegralsUpload(file).then((outcome) => {
      if ('error' in outcome) {
        setIntegralsError(outcome.error);
        setIntegralsName(null);
        return;
      }
      setIntegralsError(null);
      setIntegralsName(file.name);
      const current = getValues();
      loadRunFile({ ...current, system: outcome.system, reference: undefined, title: current.title || file.name });
    });
  };

  useEffect(() => {
    if (estimate.kind === 'error' && estimateField) setError(estimateField as never, { type: 'solver', message: estimate.message });
  }, [estimate, estimateField, setError]);

  // A bad-input answer from a run names the run-file field; put the message beside it.
  useEffect(() => {
    const failure = solver.failure;
    if (!failure || failure.code !== 'bad-input') return;
    const fields = failure.issues?.length ? failure.issues : failure.field ? [{ path: failure.field, message: failure.message }] : [];
    for (const issue of fields) {
      setError(normaliseFieldPath(issue.path) as never, { type: 'solver', message: issue.message });
    }
  }, [solver.failure, setError]);

  const onValid = (runFile: RunFile) => {
    if (blockedBy) {
      setSubmitMessage(blockedBy.replace(' to see the size of this run', ' before running'));
      return;
    }
    if (overBudget) return;
    if (estimateField) {
      setSubmitMessage('Nothing was run: fix the fields marked below their inputs.');
      return;
    }
    setSubmitMessage(null);
    void solver.run(runFile);
  };
  const onInvalid = () => setSubmitMessage('Nothing was run: fix the fields marked below their inputs.');

  const summary = formState.isSubmitted ? flattenErrors(formState.errors) : [];

  return (
    <FormProvider {...form}>
      <form
        noValidate
        onSubmit={(event) => {
          // The XYZ box is outside the run file, so the schema cannot see its errors.
          if (source === 'xyz' && xyzError) {
            event.preventDefault();
            setSubmitMessage('Nothing was run: the XYZ geometry has an error (shown beside it).');
            return;
          }
          void handleSubmit(onValid, onInvalid)(event);
        }}
        className="grid gap-5"
        data-testid="run-builder"
        aria-label="Run builder"
      >
        <FieldShell label="Title" testId="title">
          {(c) => <input {...c} type="text" maxLength={200} className={controlClass(false)} data-testid="title" {...register('title')} />}
        </FieldShell>
        <SystemSection
          source={source}
          onSourceChange={onSourceChange}
          presetId={presetId}
          onPresetChange={onPresetChange}
          xyzText={xyzText}
          xyzError={xyzError}
          onXyzText={onXyzText}
          integralsError={integralsError}
          integralsName={integralsName}
          onIntegralsFile={onIntegralsFile}
        />
        <ReferenceSection />
        <CiSpaceSection />
        <RootsSection />

        <div className="rounded-xl border border-ket-500/30 bg-ket-50 p-4 shadow-sm" data-testid="run-bar">
          <EstimatePanel state={estimate} />
          <div className="mt-3 flex flex-wrap items-center gap-3">
            <button
              type="submit"
              disabled={running || overBudget}
              data-testid="run-button"
              className="rounded-md bg-ket-600 px-5 py-2 text-sm font-semibold text-white hover:bg-ket-700 disabled:cursor-not-allowed disabled:opacity-50"
            >
              {running ? 'Running…' : 'Run in this browser'}
            </button>
            {running ? (
              <button
                type="button"
                onClick={solver.cancel}
                data-testid="cancel-button"
                className="rounded-md border border-caution-500 px-4 py-2 text-sm font-semibold text-caution-700 hover:bg-caution-50"
              >
                Cancel
              </button>
            ) : null}
            <p aria-live="polite" className="text-sm text-caution-700" data-testid="submit-message">
              {submitMessage ?? ''}
            </p>
          </div>
          {summary.length > 0 ? (
            <ul className="mt-2 list-disc pl-5 text-xs text-caution-700" data-testid="error-summary">
              {summary.map((e) => (
                <li key={e.path}>
                  <span className="font-mono">{e.path || 'run file'}</span>: {e.message}
                </li>
              ))}
            </ul>
          ) : null}
        </div>
      </form>
    </FormProvider>
  );
});
