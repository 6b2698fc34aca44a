import { expect, test, type Page } from '@playwright/test';

/**
 * Each kind of bad input the run builder can be given shows its message beside its own field
 * (inside the field's box, named by the control's aria-describedby) and nothing runs. The
 * parity of charge and multiplicity, a non-numeric XYZ coordinate and an integral file that is
 * not Ketbook's layout are checked in run-page.spec.ts.
 */

/** The message under `testId-error` sits in the same field box as the control `testId`, and the control points at it. */
async function expectBesideField(page: Page, testId: string, message: string | RegExp) {
  const error = page.getByTestId(`${testId}-error`);
  await expect(error).toContainText(message, { timeout: 20_000 });
  const box = error.locator('xpath=..');
  await expect(box.getByTestId(testId)).toHaveCount(1);
  const errorId = await error.getAttribute('id');
  expect(errorId).toBeTruthy();
  const describedBy = (await page.getByTestId(testId).getAttribute('aria-describedby')) ?? '';
  expect(describedBy.split(' ')).toContain(errorId);
  await expect(page.getByTestId(testId)).toHaveAttribute('aria-invalid', 'true');
}

/** Run is refused on the page: the worker is never asked, so no status panel appears. */
async function expectNothingRuns(page: Page) {
  await page.getByTestId('run-button').click();
  await expect(page.getByTestId('submit-message')).toContainText('Nothing was run');
  await expect(page.getByTestId('run-status')).toHaveCount(0);
  await expect(page.getByTestId('results')).toHaveCount(0);
}

async function openStarter(page: Page, preset: string) {
  await page.goto('/runs/new');
  await expect(page.getByTestId('run-builder')).toBeVisible();
  await page.getByTestId('source-starter').click();
  await page.getByTestId('preset').selectOption(preset);
}

test('fewer than one root is refused beside the roots field', async ({ page }) => {
  await openStarter(page, 'h2');
  await page.getByTestId('roots').fill('0');
  // The run-file schema asks for 1 to 50 roots (solver/runFile/schema.ts); a CI has at least its lowest state (common practice, no source).
  await expectBesideField(page, 'roots', '>=1');
  await expect(page.getByTestId('estimate')).toHaveAttribute('data-state', 'blocked');
  await expectNothingRuns(page);
});

test('an XYZ line with an unknown element is refused beside the XYZ box, naming the line', async ({ page }) => {
  await page.goto('/runs/new');
  await page.getByTestId('source-xyz').click();
  // "Qz" is no element symbol of the periodic table (IUPAC); it is on line 4 of the text.
  await page.getByTestId('xyz').fill('2\nnot a molecule\nH 0 0 0\nQz 0 0 0.74\n');
  await expectBesideField(page, 'xyz', 'line 4');
  await expect(page.getByTestId('xyz-error')).toContainText('unknown element "Qz"');
  await expect(page.getByTestId('estimate')).toHaveAttribute('data-state', 'blocked');
  await expectNothingRuns(page);
});

test('two atoms at the same place (a zero bond length) are refused beside the atoms', async ({ page }) => {
  await page.goto('/runs/new');
  await page.getByTestId('source-xyz').click();
  await page.getByTestId('xyz').fill('2\nzero bond\nH 0 0 0\nH 0 0 0\n');
  // Two nuclei at one point: infinite nuclear repulsion and a singular basis (common practice, no source).
  const error = page.getByTestId('atoms-error');
  await expect(error).toContainText('apart', { timeout: 20_000 });
  await expect(error).toContainText('atoms 1 (H) and 2 (H)');
  // The atoms' box holds the table the message is about.
  await expect(error.locator('xpath=..').getByTestId('atoms-table')).toHaveCount(1);
  await expectNothingRuns(page);

  // Moving the second atom out clears the message and the run is counted: C(2,1)² = 4 determinants (analytic count).
  await page.getByTestId('xyz').fill('2\nH2\nH 0 0 0\nH 0 0 0.74\n');
  await expect(page.getByTestId('estimate-determinants')).toHaveAttribute('data-value', '4', { timeout: 20_000 });
  await expect(error).toHaveText('');
});

test('an active window that cannot hold its electrons is refused beside the electron count', async ({ page }) => {
  await openStarter(page, 'lih');
  await page.getByTestId('ci-space').selectOption('CAS');
  await page.getByTestId('cas-orbitals').fill('2');
  await page.getByTestId('cas-electrons').fill('7');
  // Pauli: two orbitals hold at most four electrons (common practice, no source).
  await expectBesideField(page, 'cas-electrons', '2 orbitals hold at most 4 electrons');
  await expect(page.getByTestId('estimate')).toHaveAttribute('data-state', 'blocked');
  await expectNothingRuns(page);
});

test('an active window wider than the basis is refused beside the orbital count', async ({ page }) => {
  await openStarter(page, 'h2');
  await page.getByTestId('ci-space').selectOption('CAS');
  await page.getByTestId('cas-electrons').fill('2');
  // H2 in STO-3G has two orbitals, one 1s function per atom (the basis's definition).
  await page.getByTestId('cas-orbitals').fill('9');
  await expectBesideField(page, 'cas-orbitals', 'the basis has 2');
  await expectNothingRuns(page);

  // A window that fits clears it: CAS(2,2) of H2 is the full CI, C(2,1)² = 4 determinants (analytic count).
  await page.getByTestId('cas-orbitals').fill('2');
  await expect(page.getByTestId('estimate-determinants')).toHaveAttribute('data-value', '4', { timeout: 20_000 });
  await expect(page.getByTestId('cas-orbitals-error')).toHaveText('');
});

test('a Hubbard ring of two sites and a lattice over-filled with electrons are refused beside their fields', async ({ page }) => {
  await page.goto('/runs/new');
  await page.getByTestId('source-hubbard').click();
  await page.getByTestId('hubbard-sites').fill('2');
  await page.getByTestId('hubbard-electrons').fill('2');
  await page.getByTestId('hubbard-periodic').check();
  // Two sites joined "last to first" would bond them twice: a ring needs three (schema rule, common practice, no source).
  await expectBesideField(page, 'hubbard-periodic', 'a ring needs at least 3 sites');
  await expectNothingRuns(page);

  await page.getByTestId('hubbard-periodic').uncheck();
  await page.getByTestId('hubbard-electrons').fill('5');
  // Pauli: each site holds at most two electrons (common practice, no source).
  await expectBesideField(page, 'hubbard-electrons', '2 sites hold at most 4 electrons');
  await expect(page.getByTestId('hubbard-periodic-error')).toHaveText('');
  await expectNothingRuns(page);
});
