import { expect, test, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';

/** The run page and its results view, driven by their data-testid hooks. */
class MapPage {
  constructor(private readonly page: Page) {}

  async runH2Fci() {
    await this.page.goto('/runs/new');
    await expect(this.page.getByTestId('run-builder')).toBeVisible();
    await this.page.getByTestId('source-starter').click();
    await this.page.getByTestId('preset').selectOption('h2');
    await this.page.getByTestId('ci-space').selectOption('FCI');
    await expect(this.page.getByTestId('estimate')).toHaveAttribute('data-state', 'within', { timeout: 20_000 });
    await this.page.getByTestId('run-button').click();
    await expect(this.page.getByTestId('energy-root-0')).toBeVisible({ timeout: 60_000 });
  }

  async drawMap() {
    await this.page.getByTestId('map-draw').click();
    await expect(this.page.getByTestId('hamiltonian-map')).toHaveAttribute('data-state', 'ready', { timeout: 60_000 });
  }

  /** Click the centre of map element (row, column), 0-based, using the canvas's own layout. */
  async clickElement(row: number, column: number) {
    const canvas = this.page.getByTestId('map-canvas');
    const margin = Number(await canvas.getAttribute('data-margin'));
    const scale = Number(await canvas.getAttribute('data-scale'));
    await canvas.click({ position: { x: margin + (column + 0.5) * scale, y: margin + (row + 0.5) * scale } });
  }

  async value(testId: string): Promise<number> {
    return Number(await this.page.getByTestId(testId).getAttribute('data-value'));
  }
}

test('H2 full CI: the Hamiltonian map, a clicked element and its Slater–Condon breakdown', async ({ page }) => {
  const map = new MapPage(page);
  await map.runH2Fci();
  await map.drawMap();
  // Two electrons in two STO-3G orbitals: C(2,1)² = 4 determinants (analytic count)
  await expect(page.getByTestId('map-canvas')).toHaveAttribute('data-size', '4');
  await expect(page.getByTestId('map-legend')).toContainText('exactly 0');

  // The reference–double element ⟨1010|H|0101⟩: row 0 is the reference, the last row the double (levels are ordered).
  await map.clickElement(0, 3);
  await expect(page.getByTestId('breakdown')).toBeVisible();
  await expect(page.getByTestId('breakdown-det-i-alpha')).toHaveText('10');
  await expect(page.getByTestId('breakdown-det-j-alpha')).toHaveText('01');
  // Slater–Condon rules, Szabo & Ostlund (1996) §2.3.3: a double replacement has one Coulomb-type term (ai|bj)
  await expect(page.getByTestId('breakdown-differing')).toHaveAttribute('data-value', '2');
  const element = await map.value('breakdown-element');
  const sum = await map.value('breakdown-sum');
  const phase = await map.value('breakdown-phase');
  expect(Math.abs(phase * sum - element)).toBeLessThan(1e-12); // definition of the breakdown (common practice, no source)
  expect(await map.value('map-selected')).toBe(element);
  // from memory of Szabo & Ostlund (1996) §4.2: K12 = (12|21) ≈ 0.1813 hartree for H2 STO-3G at 1.4 bohr
  expect(Math.abs(element)).toBeCloseTo(0.1813, 3);

  // The reference diagonal: core energy, h11 twice and J11 (Szabo & Ostlund (1996) §3.3)
  await page.getByTestId('map-row').fill('1');
  await page.getByTestId('map-column').fill('1');
  await page.getByTestId('map-inspect').click();
  await expect(page.getByTestId('breakdown-differing')).toHaveAttribute('data-value', '0');
  await expect(page.getByTestId('breakdown-terms')).toContainText('core energy');
  const diagonal = await map.value('breakdown-element');
  expect(Math.abs((await map.value('breakdown-phase')) * (await map.value('breakdown-sum')) - diagonal)).toBeLessThan(1e-12);
  // ⟨Φ0|H|Φ0⟩ is the RHF energy (Szabo & Ostlund (1996) §3.3), to the SCF's convergence
  expect(Math.abs(diagonal - (await map.value('energy-reference')))).toBeLessThan(1e-8);
});

test('two determinants picked from the determinants table are taken apart', async ({ page }) => {
  const map = new MapPage(page);
  await map.runH2Fci();
  await page.getByTestId('pick-determinant-0').check();
  await page.getByTestId('pick-determinant-1').check();
  await page.getByTestId('pick-pair-show').click();
  await expect(page.getByTestId('pair-breakdown')).toBeVisible({ timeout: 30_000 });
  const element = await map.value('pair-breakdown-element');
  const sum = await map.value('pair-breakdown-sum');
  const phase = await map.value('pair-breakdown-phase');
  expect(Math.abs(phase * sum - element)).toBeLessThan(1e-12); // definition of the breakdown (common practice, no source)
});

test('the CSV and Hamiltonian downloads of an H2 run', async ({ page }, testInfo) => {
  const map = new MapPage(page);
  await map.runH2Fci();
  const energy = await map.value('energy-root-0');

  const [csv] = await Promise.all([page.waitForEvent('download'), page.getByTestId('download-csv-roots').click()]);
  const csvPath = testInfo.outputPath('roots.csv');
  await csv.saveAs(csvPath);
  const lines = readFileSync(csvPath, 'utf8').split('\r\n'); // RFC 4180 §2: CRLF ends each record
  expect(lines[0].split(',')[1]).toBe('energy_hartree');
  expect(Number(lines[1].split(',')[1])).toBe(energy);

  const [ham] = await Promise.all([page.waitForEvent('download', { timeout: 60_000 }), page.getByTestId('download-basis-hamiltonian').click()]);
  const hamPath = testInfo.outputPath('basis-hamiltonian.json');
  await ham.saveAs(hamPath);
  const layout = JSON.parse(readFileSync(hamPath, 'utf8'));
  expect(layout.type).toBe('integrals');
  // Szabo & Ostlund (1996) §3.5.2: S12 = 0.6593 for H2 STO-3G at 1.4 bohr
  expect(layout.overlap[0][1]).toBeCloseTo(0.6593, 4);
});
