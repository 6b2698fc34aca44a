import type { RunFile } from './schema';

/**
 * Short labels for a run, used where runs are listed side by side (the workspace's run table,
 * file names). They are derived from the run file alone, so they never disagree with it.
 */
export interface RunLabels {
  /** Hill formula with charge for molecules ("H2", "HeH+", "CH4"); a short phrase otherwise. */
  system: string;
  basis: string;
  /** Reference and CI space, e.g. "RHF · FCI", "ROHF · CAS(2,2)", "RHF · CI(3) fc1". */
  method: string;
}

/**
 * Hill order (Hill, J. Am. Chem. Soc. 22, 478 (1900)): with carbon, C then H then the rest
 * alphabetically; without carbon, every symbol alphabetically. Ghost atoms carry no electrons
 * and are left out of the formula.
 */
export function hillFormula(symbols: string[], charge = 0): string {
  const counts = new Map<string, number>();
  for (const s of symbols) counts.set(s, (counts.get(s) ?? 0) + 1);
  const names = [...counts.keys()].sort();
  const ordered = counts.has('C') ? ['C', ...(counts.has('H') ? ['H'] : []), ...names.filter((n) => n !== 'C' && n !== 'H')] : names;
  const body = ordered.map((n) => `${n}${counts.get(n)! > 1 ? counts.get(n) : ''}`).join('');
  if (charge === 0) return body;
  const magnitude = Math.abs(charge) > 1 ? String(Math.abs(charge)) : '';
  return `${body}${magnitude}${charge > 0 ? '+' : '−'}`;
}

function basisLabel(runFile: RunFile): string {
  const system = runFile.system;
  if (system.type !== 'molecule') return system.type === 'hubbard' ? 'site basis' : 'given orbitals';
  const basis = system.basis;
  const zeta = system.zeta ? ' (own ζ)' : '';
  if (typeof basis === 'string') return `${basis}${zeta}`;
  const named = (basis as { name?: string }).name;
  return `${named ?? (basis.type === 'even-tempered' ? 'even-tempered set' : 'custom set')}${zeta}`;
}

function methodLabel(runFile: RunFile): string {
  const reference = runFile.system.type === 'molecule' ? (runFile.reference ?? 'RHF') : runFile.reference ?? null;
  const ci = runFile.ci;
  const parts: string[] = [];
  if (reference) parts.push(reference);
  if (ci) {
    let space: string = ci.space;
    if (ci.space === 'CI' && ci.excitationLevel !== undefined) space = `CI(${ci.excitationLevel})`;
    if (ci.space === 'CAS') {
      space = ci.active ? `CAS(${ci.active.electrons},${ci.active.orbitals})` : ci.activeOrbitals ? `CAS[${ci.activeOrbitals.length} orbitals]` : 'CAS';
    }
    if (ci.ras) space += ' RAS';
    if (ci.frozenCore > 0) space += ` fc${ci.frozenCore}`;
    if (ci.deletedVirtuals > 0) space += ` dv${ci.deletedVirtuals}`;
    if (ci.roots > 1) space += `, ${ci.roots} roots`;
    parts.push(space);
  }
  return parts.length ? parts.join(' · ') : 'orbitals only';
}

function systemLabel(runFile: RunFile): string {
  const system = runFile.system;
  if (system.type === 'molecule') {
    const real = system.atoms.filter((a) => !(a.length === 5 && a[4].ghost)).map((a) => a[0]);
    const formula = hillFormula(real, system.charge);
    return real.length < system.atoms.length ? `${formula} + ghosts` : formula;
  }
  if (system.type === 'hubbard') return `Hubbard ${system.periodic ? 'ring' : 'chain'} ${system.sites} sites, U/t = ${system.U / system.t}`;
  return `integrals, ${system.orbitals} orbitals`;
}

export function describeRunFile(runFile: RunFile): RunLabels {
  return { system: systemLabel(runFile), basis: basisLabel(runFile), method: methodLabel(runFile) };
}
