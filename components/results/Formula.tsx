import katex from 'katex';

/** A formula typeset by KaTeX into HTML (and MathML for screen readers). */
export function Formula({ tex, display = false, testId }: { tex: string; display?: boolean; testId?: string }) {
  const html = katex.renderToString(tex, { displayMode: display, throwOnError: false, output: 'htmlAndMathml' });
  return <span data-testid={testId} className={display ? 'block overflow-x-auto' : undefined} dangerouslySetInnerHTML={{ __html: html }} />;
}

/** The definitions the energies table uses, written once. */
export const FORMULAS = {
  correlation: String.raw`E_\mathrm{corr} = E_\mathrm{CI} - E_\mathrm{ref}`,
  excitation: String.raw`\Delta E_k = E_k - E_0`,
  // Langhoff & Davidson, Int. J. Quantum Chem. 8, 61 (1974): size-extensivity estimate for CISD.
  plusQ: String.raw`E_{+Q} = E_\mathrm{CI} + \left(1 - c_0^2\right)\left(E_\mathrm{CI} - E_\mathrm{ref}\right)`,
  referenceWeight: String.raw`c_0^2 = \lvert\langle \Phi_\mathrm{ref} \vert \Psi \rangle\rvert^2`,
} as const;
