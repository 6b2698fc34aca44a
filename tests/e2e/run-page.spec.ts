import { expect, test, type Page } from '@playwright/test';
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';

const repoRoot = path.resolve(__dirname, '../..');

/** The run page as a user drives it, by its data-testid hooks. */
class RunPage {
  constructor(private readonly page: Page) {}

  async open() {
    await this.page.goto('/runs/new');
    await expect(this.page.getByTestId('run-builder')).toBeVisible();
  }

  async choosePreset(id: string, space: string) {
    await this.page.getByTestId('source-starter').click();
    await this.page.getByTestId('preset').selectOption(id);
    await this.page.getByTestId('ci-space').selectOption(space);
  }

  /** Pick the CI space without touching the system (for uploaded or pasted systems). */
  async choosePresetless(space: string) {
    await this.page.getByTestId('ci-space').selectOption(space);
  }

  estimate() {
    return this.page.getByTestId('estimate');
  }

  async run() {
    await expect(this.estimate()).toHaveAttribute('data-state', 'within', { timeout: 20_000 });
    await this.page.getByTestId('run-button').click();
  }

  status() {
    return this.page.getByTestId('run-status');
  }

  async rootEnergy(k: number): Promise<number> {
    const cell = this.page.getByTestId(`energy-root-${k}`);
    await expect(cell).toBeVisible({ timeout: 60_000 });
    return Number(await cell.getAttribute('data-value'));
  }

  async downloadRunFile(savePath: string) {
    const [download] = await Promise.all([this.page.waitForEvent('download'), this.page.getByTestId('download-run-file').click()]);
    await download.saveAs(savePath);
  }
}

/** The command-line face, exactly as a user would run it on the downloaded file. */
function solveWithCli(runFilePath: string): { ci: { roots: { energy: number }[] } } {
  const stdout = execFileSync('npx', ['tsx', 'workers/cli.ts', runFilePath, '--quiet'], {
    cwd: repoRoot,
    encoding: 'utf8',
    timeout: 120_000,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  return JSON.parse(stdout);
}

test('H2 full CI in the browser agrees with the command line on the downloaded run file', async ({ page }, testInfo) => {
  const runPage = new RunPage(page);
  await runPage.open();
  await runPage.choosePreset('h2', 'FCI');
  // Two electrons in two STO-3G orbitals: C(2,1)² = 4 determinants (analytic count).
  await expect(page.getByTestId('estimate-determinants')).toHaveAttribute('data-value', '4', { timeout: 20_000 });
  await runPage.run();
  await expect(runPage.status()).toBeVisible();
  const energy = await runPage.rootEnergy(0);
  await expect(runPage.status()).toHaveAttribute('data-status', 'done');
  await expect(page.getByTestId('progress-scf')).toContainText('iteration');
  // from memory of Szabo & Ostlund (1996) §4.3: H2 STO-3G full CI at R = 1.4 bohr ≈ −1.1373 hartree
  expect(energy).toBeCloseTo(-1.1373, 3);
  await expect(page.getByTestId('results-caution')).toContainText('not for safety-relevant decisions');

  const runFilePath = testInfo.outputPath('h2.run.json');
  await runPage.downloadRunFile(runFilePath);
  expect(JSON.parse(readFileSync(runFilePath, 'utf8')).format).toBe('ketbook-run/1');
  const cli = solveWithCli(runFilePath);
  expect(Math.abs(cli.ci.roots[0].energy - energy)).toBeLessThan(1e-10);

  // The unit switcher changes the shown text, never the stored value.
  await page.getByTestId('unit-eV').check({ force: true });
  await expect(page.getByTestId('shown-unit')).toHaveText('eV');
  expect(Number(await page.getByTestId('energy-root-0').getAttribute('data-value'))).toBe(energy);
});

test('a heavy run can be cancelled, and the next run still works', async ({ page }) => {
  const runPage = new RunPage(page);
  await runPage.open();
  await runPage.choosePreset('h10-chain', 'FCI');
  await runPage.run();
  await expect(page.getByTestId('progress-phase')).toBeVisible();
  await page.getByTestId('cancel-button').click();
  await expect(page.getByTestId('run-cancelled')).toBeVisible();
  await expect(page.getByTestId('results')).toHaveCount(0);

  await runPage.choosePreset('h2', 'FCI');
  await runPage.run();
  const energy = await runPage.rootEnergy(0);
  expect(energy).toBeCloseTo(-1.1373, 3); // from memory of Szabo & Ostlund (1996) §4.3
});

test('an impossible multiplicity is shown beside its field and nothing runs', async ({ page }) => {
  const runPage = new RunPage(page);
  await runPage.open();
  await runPage.choosePreset('h2', 'FCI');
  await page.getByTestId('reference').selectOption('ROHF');
  await page.getByTestId('multiplicity').fill('2');
  // Two electrons cannot form a doublet (N − 2S must be even): common practice, no source.
  await expect(page.getByTestId('multiplicity-error')).toContainText('cannot have multiplicity 2');
  await page.getByTestId('run-button').click();
  await expect(page.getByTestId('submit-message')).toContainText('Nothing was run');
  await expect(runPage.status()).toHaveCount(0);
});

test('a malformed XYZ geometry is shown beside the box and nothing runs', async ({ page }) => {
  const runPage = new RunPage(page);
  await runPage.open();
  await page.getByTestId('source-xyz').click();
  await page.getByTestId('xyz').fill('2\nbroken\nH 0 0 0\nH 0 0 zero-point-seven\n');
  await expect(page.getByTestId('xyz-error')).toContainText('line 4');
  await page.getByTestId('run-button').click();
  await expect(page.getByTestId('submit-message')).toContainText('Nothing was run');
  await expect(runPage.status()).toHaveCount(0);

  // A good geometry clears the message and is counted.
  await page.getByTestId('xyz').fill('2\nH2\nH 0 0 0\nH 0 0 0.74\n');
  await expect(page.getByTestId('xyz-error')).toHaveText('');
  await expect(page.getByTestId('estimate-determinants')).toHaveAttribute('data-value', '4', { timeout: 20_000 });
});

test('a run over the memory budget is refused with what to change, and Run is off', async ({ page }) => {
  const runPage = new RunPage(page);
  await runPage.open();
  await page.getByTestId('source-hubbard').click();
  await page.getByTestId('hubbard-sites').fill('16');
  await page.getByTestId('hubbard-electrons').fill('16');
  // Half-filled 16 sites: C(16,8)² ≈ 1.65e8 determinants, far beyond 1 GiB (analytic count).
  await expect(page.getByTestId('estimate-refusal')).toContainText('budget', { timeout: 20_000 });
  await expect(page.getByTestId('estimate-refusal')).toContainText('To shrink it');
  await expect(page.getByTestId('run-button')).toBeDisabled();
});

test('an uploaded integral file runs, and a file that is not an integral layout is refused beside the upload', async ({ page }) => {
  const runPage = new RunPage(page);
  await runPage.open();
  await page.getByTestId('source-integrals').click();
  await page.getByTestId('integrals-file').setInputFiles({ name: 'bad.json', mimeType: 'application/json', buffer: Buffer.from('{"type":"molecule"}') });
  await expect(page.getByTestId('integrals-file-error')).toContainText('"type": "integrals"');
  await expect(runPage.estimate()).toContainText('Load an integral file');

  // Two sites, hopping t = 1 (h01 = −1), on-site repulsion U = 4, two electrons, in Ketbook's integral layout.
  const U = 4;
  const layout = { type: 'integrals', orbitals: 2, electrons: 2, multiplicity: 1, coreEnergy: 0, oneBody: [[0, -1], [-1, 0]], twoBody: [[0, 0, 0, 0, U], [1, 1, 1, 1, U]] };
  await page.getByTestId('integrals-file').setInputFiles({ name: 'dimer.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(layout)) });
  await expect(page.getByTestId('integrals-summary')).toContainText('2 orbitals');
  await runPage.choosePresetless('FCI');
  await runPage.run();
  const energy = await runPage.rootEnergy(0);
  // Analytic two-site Hubbard singlet ground state: E = U/2 − √(U²/4 + 4t²) (common practice, no source).
  expect(energy).toBeCloseTo(U / 2 - Math.sqrt((U * U) / 4 + 4), 9);
});
