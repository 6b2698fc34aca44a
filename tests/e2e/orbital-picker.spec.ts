import { expect, test } from '@playwright/test';

async function openLiH(page: import('@playwright/test').Page, space: string) {
  await page.goto('/runs/new');
  await expect(page.getByTestId('run-builder')).toBeVisible();
  await page.getByTestId('source-starter').click();
  await page.getByTestId('preset').selectOption('lih');
  await page.getByTestId('ci-space').selectOption(space);
}

test('the orbital picker shows a quick SCF of LiH and turns two ticked orbitals into a CAS window that runs', async ({ page }) => {
  await openLiH(page, 'FCI');
  await page.getByTestId('picker-scf').click();
  const rows = page.getByTestId('picker-row');
  // LiH in STO-3G: Li 1s 2s 2p (5 functions) + H 1s = 6 orbitals; 4 electrons fill the lowest two
  // (common practice, no source).
  await expect(rows).toHaveCount(6, { timeout: 30_000 });
  await expect(rows.nth(0).locator('td').nth(3)).toHaveText('2');
  await expect(rows.nth(1).locator('td').nth(3)).toHaveText('2');
  await expect(rows.nth(2).locator('td').nth(3)).toHaveText('0');
  // Orbital energies ascend (aufbau order of the SCF; common practice, no source).
  const energies = await Promise.all([0, 1, 2, 3, 4, 5].map(async (k) => Number(await rows.nth(k).locator('td').nth(1).innerText())));
  expect([...energies].sort((a, b) => a - b)).toEqual(energies);

  const labels = await Promise.all([1, 2].map(async (k) => rows.nth(k).locator('td').nth(2).innerText()));
  await page.getByTestId('pick-1').check();
  await page.getByTestId('pick-2').check();
  await page.getByTestId('picker-use-window').click();
  await expect(page.getByTestId('ci-space')).toHaveValue('CAS');
  // Orbital 1 holds two electrons, orbital 2 none: a window of 2 electrons in 2 orbitals.
  await expect(page.getByTestId('cas-electrons')).toHaveValue('2');
  await expect(page.getByTestId('cas-orbitals')).toHaveValue('2');
  if (labels[0] === labels[1]) {
    // Two electrons (Ms = 0) in two orbitals of one symmetry: C(2,1)² = 4 determinants (analytic count).
    await expect(page.getByTestId('estimate-determinants')).toHaveAttribute('data-value', '4', { timeout: 20_000 });
  }
  await expect(page.getByTestId('estimate')).toHaveAttribute('data-state', 'within', { timeout: 20_000 });
  await page.getByTestId('run-button').click();
  await expect(page.getByTestId('energy-root-0')).toBeVisible({ timeout: 60_000 });
  const cas = Number(await page.getByTestId('energy-root-0').getAttribute('data-value'));
  const reference = Number(await page.getByTestId('energy-reference').getAttribute('data-value'));
  // A CASCI that contains the reference determinant lies at or below it (variational principle).
  expect(cas).toBeLessThanOrEqual(reference + 1e-10);
});

test('RAS limits from the picker: a negative hole limit is refused beside its field and nothing runs', async ({ page }) => {
  await openLiH(page, 'FCI');
  await page.getByTestId('ras-enabled').check();
  await expect(page.getByTestId('ras-limits')).toBeVisible();
  await page.getByTestId('ras-max-holes').fill('-1');
  const error = page.getByTestId('ras-max-holes-error');
  await expect(error).not.toBeEmpty({ timeout: 20_000 });
  const describedBy = (await page.getByTestId('ras-max-holes').getAttribute('aria-describedby')) ?? '';
  expect(describedBy.split(' ')).toContain(await error.getAttribute('id'));
  await page.getByTestId('run-button').click();
  await expect(page.getByTestId('submit-message')).toContainText('Nothing was run');
  await expect(page.getByTestId('run-status')).toHaveCount(0);
});
