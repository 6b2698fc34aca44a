import { expect, test } from '@playwright/test';

// STO-3G for hydrogen (ζ = 1.24): exponents and contraction coefficients as printed by Szabo &
// Ostlund (1996), eq. 3.225 and Table 3.x (from Hehre, Stewart & Pople, J. Chem. Phys. 51, 2657 (1969)).
const hydrogenSto3g = {
  type: 'custom',
  name: 'H 1s as STO-3G, typed in',
  elements: {
    H: [{ shell: 's', exponents: [3.42525091, 0.62391373, 0.1688554], coefficients: [0.15432897, 0.53532814, 0.44463454] }],
  },
};

function jsonFile(name: string, value: unknown) {
  return { name, mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(value)) };
}

async function runEnergy(page: import('@playwright/test').Page): Promise<number> {
  await expect(page.getByTestId('estimate')).toHaveAttribute('data-state', 'within', { timeout: 20_000 });
  await page.getByTestId('run-button').click();
  await expect(page.getByTestId('run-status')).toHaveAttribute('data-status', 'done', { timeout: 60_000 });
  return Number(await page.getByTestId('energy-root-0').getAttribute('data-value'));
}

test('a custom basis file that spells out STO-3G gives the built-in STO-3G energy of H2', async ({ page }) => {
  await page.goto('/runs/new');
  await page.getByTestId('source-starter').click();
  await page.getByTestId('preset').selectOption('h2');
  await page.getByTestId('ci-space').selectOption('FCI');
  await page.getByTestId('basis').selectOption('STO-3G');
  const builtIn = await runEnergy(page);

  await page.getByTestId('basis-file').setInputFiles(jsonFile('h-sto3g.json', hydrogenSto3g));
  await expect(page.getByTestId('basis')).toHaveValue('uploaded');
  const uploaded = await runEnergy(page);
  // The same published primitives, so the same energy up to the digits the table prints (8 decimals).
  expect(Math.abs(uploaded - builtIn)).toBeLessThan(1e-6);
  // from memory of Szabo & Ostlund (1996) §4.3: H2 STO-3G full CI at R = 1.4 bohr ≈ −1.1373 hartree
  expect(uploaded).toBeCloseTo(-1.1373, 3);
});

test('a malformed basis file is refused beside the upload, and nothing runs', async ({ page }) => {
  await page.goto('/runs/new');
  await page.getByTestId('source-starter').click();
  await page.getByTestId('preset').selectOption('h2');
  // Not a basis-set object at all: the form keeps its basis.
  await page.getByTestId('basis-file').setInputFiles(jsonFile('wrong.json', { hello: 'world' }));
  await expect(page.getByTestId('basis-file-error')).toContainText('"type": "custom"');
  await expect(page.getByTestId('basis')).not.toHaveValue('uploaded');

  // Three exponents but two coefficients: the run-file schema's own message, beside the upload.
  const broken = { ...hydrogenSto3g, elements: { H: [{ shell: 's', exponents: [3.4, 0.6, 0.17], coefficients: [0.15, 0.53] }] } };
  await page.getByTestId('basis-file').setInputFiles(jsonFile('broken.json', broken));
  await expect(page.getByTestId('basis-file-error')).toContainText('3 exponents but 2 coefficients', { timeout: 20_000 });
  await page.getByTestId('run-button').click();
  await expect(page.getByTestId('submit-message')).toContainText('Nothing was run');
  await expect(page.getByTestId('run-status')).toHaveCount(0);
});
