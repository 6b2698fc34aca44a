'use client';
import type { RunResult } from '../../solver/run/result';
import { EnergiesTable } from './EnergiesTable';
import { OrbitalEnergies } from './OrbitalEnergies';
import { DeterminantsTable } from './DeterminantsTable';
import { ProvenancePanel } from './ProvenancePanel';
import { downloadName, saveJson } from './downloadJson';

function Panel({ title, children, testId }: { title: string; children: React.ReactNode; testId: string }) {
  return (
    <section className="rounded-xl border border-ink-soft/15 bg-white p-5 shadow-sm" aria-label={title} data-testid={testId}>
      <h3 className="mb-3 text-base font-semibold text-ink">{title}</h3>
      {children}
    </section>
  );
}

/** A finished run: energies, orbitals, determinants, provenance, warnings and the two downloads. */
export function ResultsView({ result, runFile }: { result: RunResult; runFile: unknown }) {
  const title = (runFile as { title?: string } | null)?.title;
  return (
    <div className="grid gap-4" data-testid="results">
      <h2 className="text-xl font-bold tracking-tight text-ink" data-testid="results-title">
        Result{title ? `: ${title}` : ''}
      </h2>
      <div className="rounded-lg border-l-4 border-caution-500 bg-caution-50 p-3 text-sm text-caution-700" data-testid="results-caution" role="note">
        Minimal-basis numbers are qualitative; not for safety-relevant decisions.
      </div>
      {result.warnings.length > 0 ? (
        <ul className="grid gap-1 rounded-lg bg-caution-50 p-3 text-sm text-caution-700" data-testid="warnings" aria-label="Warnings">
          {result.warnings.map((w, i) => (
            <li key={i}>⚠ {w}</li>
          ))}
        </ul>
      ) : null}
      <Panel title="Energies" testId="panel-energies">
        <EnergiesTable result={result} />
      </Panel>
      {result.ci && result.ci.roots.length > 0 ? (
        <Panel title="Determinants" testId="panel-determinants">
          <DeterminantsTable roots={result.ci.roots} />
        </Panel>
      ) : null}
      <Panel title="Orbitals" testId="panel-orbitals">
        <OrbitalEnergies result={result} />
      </Panel>
      <Panel title="Provenance" testId="panel-provenance">
        <ProvenancePanel result={result} />
      </Panel>
      <div className="flex flex-wrap gap-3">
        <button
          type="button"
          onClick={() => saveJson(runFile, downloadName(title, 'run'))}
          className="rounded-md border border-ket-500 px-4 py-2 text-sm font-semibold text-ket-700 hover:bg-ket-50"
          data-testid="download-run-file"
        >
          Download run file
        </button>
        <button
          type="button"
          onClick={() => saveJson(result, downloadName(title, 'result'))}
          className="rounded-md border border-ket-500 px-4 py-2 text-sm font-semibold text-ket-700 hover:bg-ket-50"
          data-testid="download-result"
        >
          Download result
        </button>
      </div>
    </div>
  );
}
