'use client';
import { useState } from 'react';
import type { DeterminantEntry, RunResult } from '../../solver/run/result';
import type { ElementBreakdown as Breakdown } from '../../solver/run/hamiltonianMap';
import type { HamiltonianExportKind } from '../../workers/solver.worker';
import { EnergiesTable } from './EnergiesTable';
import { OrbitalEnergies } from './OrbitalEnergies';
import { DeterminantsTable } from './DeterminantsTable';
import { ProvenancePanel } from './ProvenancePanel';
import { downloadName, saveJson, saveText } from './downloadJson';
import { determinantsCsv, rootsCsv } from './resultsCsv';
import { useResultsWorker } from './useResultsWorker';
import { HamiltonianMapPanel } from './HamiltonianMapPanel';
import { ElementBreakdown } from './ElementBreakdown';
import { NaturalOrbitals } from './NaturalOrbitals';

const BUTTON = 'rounded-md border border-ket-500 px-4 py-2 text-sm font-semibold text-ket-700 hover:bg-ket-50 disabled:opacity-50';

function Panel({ title, children, testId }: { title: string; children: React.ReactNode; testId: string }) {
  return (
    <section className="rounded-xl border border-ink-soft/15 bg-white p-5 shadow-sm" aria-label={title} data-testid={testId}>
      <h3 className="mb-3 text-base font-semibold text-ink">{title}</h3>
      {children}
    </section>
  );
}

/**
 * A finished run: energies, determinants (with a pair picker), the Hamiltonian map, orbitals
 * and natural orbitals, provenance, warnings and the downloads. The map, the breakdowns and
 * the Hamiltonian downloads are computed in the view's own worker from the run file.
 */
export function ResultsView({ result, runFile }: { result: RunResult; runFile: unknown }) {
  const title = (runFile as { title?: string } | null)?.title;
  const worker = useResultsWorker();
  const [pair, setPair] = useState<Breakdown | null>(null);
  const [pairMessage, setPairMessage] = useState<string | null>(null);
  const [exporting, setExporting] = useState<HamiltonianExportKind | null>(null);
  const [downloadMessage, setDownloadMessage] = useState<string | null>(null);
  const hasCi = result.ci !== null && result.ci.roots.length > 0;

  const pickPair = async (first: DeterminantEntry, second: DeterminantEntry) => {
    const outcome = await worker.determinantPairElement(runFile, { alpha: first.alpha, beta: first.beta }, { alpha: second.alpha, beta: second.beta });
    if (outcome.ok) {
      setPair(outcome.value);
      setPairMessage(null);
    } else {
      setPair(null);
      setPairMessage(outcome.error.message);
    }
  };

  const downloadHamiltonian = async (kind: HamiltonianExportKind) => {
    setExporting(kind);
    setDownloadMessage(null);
    const outcome = await worker.exportHamiltonian(runFile, kind);
    setExporting(null);
    if (outcome.ok) saveJson(outcome.value, downloadName(title, kind === 'basis' ? 'basis-hamiltonian' : 'orbital-hamiltonian'));
    else setDownloadMessage(outcome.error.message);
  };
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
          <DeterminantsTable roots={result.ci.roots} onPickPair={pickPair} />
          {pairMessage ? (
            <p className="mt-2 rounded-md bg-caution-50 p-2 text-sm text-caution-700" role="alert" data-testid="pair-message">
              {pairMessage}
            </p>
          ) : null}
          {pair ? (
            <div className="mt-3">
              <ElementBreakdown breakdown={pair} energyUnit={result.energyUnit} testId="pair-breakdown" />
            </div>
          ) : null}
        </Panel>
      ) : null}
      {hasCi ? (
        <Panel title="Hamiltonian map" testId="panel-hamiltonian-map">
          <HamiltonianMapPanel runFile={runFile} worker={worker} />
        </Panel>
      ) : null}
      <Panel title="Orbitals" testId="panel-orbitals">
        <OrbitalEnergies result={result} />
      </Panel>
      {hasCi ? (
        <Panel title="Natural orbitals" testId="panel-natural-orbitals">
          <NaturalOrbitals result={result} />
        </Panel>
      ) : null}
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
        <button type="button" onClick={() => saveText(rootsCsv(result), downloadName(title, 'roots', 'csv'), 'text/csv')} className={BUTTON} data-testid="download-csv-roots">
          Download roots (CSV)
        </button>
        {hasCi ? (
          <button
            type="button"
            onClick={() => saveText(determinantsCsv(result), downloadName(title, 'determinants', 'csv'), 'text/csv')}
            className={BUTTON}
            data-testid="download-csv-determinants"
          >
            Download determinants (CSV)
          </button>
        ) : null}
        {hasCi ? (
          <button type="button" onClick={() => downloadHamiltonian('orbitals')} disabled={exporting !== null} className={BUTTON} data-testid="download-orbital-hamiltonian">
            {exporting === 'orbitals' ? 'Preparing…' : 'Download CI Hamiltonian (active orbitals)'}
          </button>
        ) : null}
        {result.system.type === 'molecule' ? (
          <button type="button" onClick={() => downloadHamiltonian('basis')} disabled={exporting !== null} className={BUTTON} data-testid="download-basis-hamiltonian">
            {exporting === 'basis' ? 'Preparing…' : 'Download basis-function Hamiltonian'}
          </button>
        ) : null}
      </div>
      <p className="text-xs text-ink-soft">
        Both Hamiltonians are in Ketbook&apos;s integral layout, ready to upload as an integral file: the CI one over the active orbitals with the
        core folded into coreEnergy; the basis-function one with the nuclear repulsion as coreEnergy and the overlap matrix, orthogonalised on upload.
      </p>
      {downloadMessage ? (
        <p className="rounded-md bg-caution-50 p-2 text-sm text-caution-700" role="alert" data-testid="download-message">
          {downloadMessage}
        </p>
      ) : null}
    </div>
  );
}
