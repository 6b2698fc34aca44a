'use client';
import type { ElementBreakdown as Breakdown } from '../../solver/run/hamiltonianMap';
import { Formula } from './Formula';
import { expansionTex, ruleTex, termTex } from './breakdownTex';

const KIND_LABEL: Record<string, string> = {
  core: 'core energy',
  'one-electron': 'one-electron',
  coulomb: 'Coulomb',
  exchange: 'exchange',
};

function Determinant({ label, alpha, beta, testId }: { label: string; alpha: string; beta: string; testId: string }) {
  return (
    <div className="flex items-baseline gap-2" data-testid={testId}>
      <span className="font-semibold">{label}</span>
      <span className="font-mono tracking-wider">
        α <span data-testid={`${testId}-alpha`}>{alpha}</span> β <span data-testid={`${testId}-beta`}>{beta}</span>
      </span>
    </div>
  );
}

/**
 * ⟨D_I|H|D_J⟩ taken apart by the Slater–Condon rules: the two determinants, how many spin
 * orbitals differ, the phase, each integral with its value, and phase × Σ terms = element.
 * Every number is the solver's; the cells carry full precision in data-value.
 */
export function ElementBreakdown({ breakdown: b, energyUnit, testId = 'breakdown' }: { breakdown: Breakdown; energyUnit: string; testId?: string }) {
  const unit = energyUnit === 't' ? 't' : 'Eh';
  return (
    <div className="grid gap-2 rounded-lg border border-ket-100 bg-ket-50/40 p-3 text-sm" data-testid={testId}>
      <div className="grid gap-1">
        <Determinant label="D_I" alpha={b.alphaI} beta={b.betaI} testId={`${testId}-det-i`} />
        <Determinant label="D_J" alpha={b.alphaJ} beta={b.betaJ} testId={`${testId}-det-j`} />
        {b.row >= 0 ? (
          <p className="text-xs text-ink-soft">
            Map row {b.row + 1}, column {b.column + 1}.
          </p>
        ) : null}
      </div>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
        <dt className="text-ink-soft">Spin orbitals that differ</dt>
        <dd className="font-mono" data-testid={`${testId}-differing`} data-value={b.differingSpinOrbitals}>
          {b.differingSpinOrbitals}
        </dd>
        <dt className="text-ink-soft">Phase</dt>
        <dd className="font-mono" data-testid={`${testId}-phase`} data-value={b.phase}>
          {b.phase > 0 ? '+1' : b.phase < 0 ? '−1' : '0 (no terms)'}
        </dd>
      </dl>
      <Formula tex={ruleTex(b.differingSpinOrbitals)} display testId={`${testId}-rule`} />
      <Formula tex={expansionTex(b)} display testId={`${testId}-formula`} />
      {b.terms.length > 0 ? (
        <div className="max-h-72 overflow-auto">
          <table className="w-full text-right text-xs" data-testid={`${testId}-terms`}>
            <thead className="text-ink-soft">
              <tr>
                <th className="py-1 pr-3 text-left font-semibold">term</th>
                <th className="py-1 pr-3 text-left font-semibold">kind</th>
                <th className="py-1 pr-3 text-left font-semibold">spins</th>
                <th className="py-1 pr-3 font-semibold">factor</th>
                <th className="py-1 pr-3 font-semibold">integral ({unit})</th>
                <th className="py-1 font-semibold">factor × integral</th>
              </tr>
            </thead>
            <tbody className="font-mono">
              {b.terms.map((t, k) => (
                <tr key={k} className="border-t border-ink-soft/10" data-testid={`${testId}-term-${k}`} data-value={t.factor * t.integral}>
                  <td className="py-0.5 pr-3 text-left">
                    <Formula tex={termTex(t)} />
                  </td>
                  <td className="py-0.5 pr-3 text-left font-sans">{KIND_LABEL[t.kind] ?? t.kind}</td>
                  <td className="py-0.5 pr-3 text-left font-sans">{t.spin ?? '—'}</td>
                  <td className="py-0.5 pr-3">{t.factor > 0 ? '+1' : '−1'}</td>
                  <td className="py-0.5 pr-3">{t.integral.toFixed(10)}</td>
                  <td className="py-0.5">{(t.factor * t.integral).toFixed(10)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
        <dt className="text-ink-soft">Σ factor × integral</dt>
        <dd className="font-mono" data-testid={`${testId}-sum`} data-value={b.termSum}>
          {b.termSum.toFixed(12)} {unit}
        </dd>
        <dt className="font-semibold">Element = phase × Σ</dt>
        <dd className="font-mono font-semibold" data-testid={`${testId}-element`} data-value={b.value}>
          {b.value.toFixed(12)} {unit}
        </dd>
      </dl>
    </div>
  );
}
