import { expect, test, type Page } from '@playwright/test';
import { DEMO_PEOPLE } from '../../db/seeds/demoScenario';
import { AuthPages } from '../pages/AuthPages';

function demoPerson(role: 'editor' | 'viewer') {
  const person = DEMO_PEOPLE.find((p) => p.memberships.larkspur === role);
  if (!person) throw new Error(`the demo seed has no larkspur ${role}`);
  return { email: person.email, password: person.password };
}

const PANELS = ['panel-energies', 'panel-determinants', 'panel-orbitals', 'panel-provenance'];

async function panelTexts(page: Page): Promise<string[]> {
  return Promise.all(PANELS.map((id) => page.getByTestId(id).innerText()));
}

async function runH2(page: Page) {
  await page.goto('/runs/new');
  await page.getByTestId('source-starter').click();
  await page.getByTestId('preset').selectOption('h2');
  await page.getByTestId('ci-space').selectOption('FCI');
  await expect(page.getByTestId('estimate')).toHaveAttribute('data-state', 'within', { timeout: 20_000 });
  await page.getByTestId('run-button').click();
  await expect(page.getByTestId('energy-root-0')).toBeVisible({ timeout: 60_000 });
  return Number(await page.getByTestId('energy-root-0').getAttribute('data-value'));
}

test('an editor saves an H2 run; its stable address shows every panel unchanged, after a reload too, and it reproduces', async ({ page }) => {
  const title = `H2 equilibrium ${Date.now().toString(36)}`;
  await new AuthPages(page).signIn(demoPerson('editor'));
  const energy = await runH2(page);
  // from memory of Szabo & Ostlund (1996) §4.3: H2 STO-3G full CI at R = 1.4 bohr ≈ −1.1373 hartree
  expect(energy).toBeCloseTo(-1.1373, 3);
  const before = await panelTexts(page);

  // A title the API refuses (empty) is shown beside its field, and nothing is saved.
  await page.getByTestId('save-run-title').fill('   ');
  await page.getByTestId('save-run-submit').click();
  await expect(page.getByTestId('save-run-form')).toContainText('Enter a title.');
  await expect(page.getByTestId('save-run-done')).toHaveCount(0);
  // So is a tag the tag rules refuse.
  await page.getByTestId('save-run-title').fill(title);
  await page.getByTestId('save-run-tags').fill('equilibrium, #bad');
  await page.getByTestId('save-run-submit').click();
  await expect(page.getByTestId('save-run-form')).toContainText('A tag uses letters');
  await expect(page.getByTestId('save-run-done')).toHaveCount(0);

  await page.getByTestId('save-run-tags').fill('equilibrium, e2e');
  await page.getByTestId('save-run-submit').click();
  const link = page.getByTestId('saved-run-link');
  await expect(link).toBeVisible({ timeout: 20_000 });
  const url = (await link.getAttribute('href'))!;
  expect(url).toMatch(/^\/workspaces\/larkspur\/runs\/[A-Za-z0-9_-]{16}$/);

  await page.goto(url);
  await expect(page.getByTestId('saved-run-title')).toHaveText(title);
  await expect(page.getByTestId('saved-run-labels')).toContainText('H2 · STO-3G · RHF · FCI');
  await expect(page.getByTestId('saved-run-vector')).toContainText('whole');
  expect(Number(await page.getByTestId('energy-root-0').getAttribute('data-value'))).toBe(energy);
  expect(await panelTexts(page)).toEqual(before);
  await page.reload();
  expect(Number(await page.getByTestId('energy-root-0').getAttribute('data-value'))).toBe(energy);
  expect(await panelTexts(page)).toEqual(before);

  await page.getByTestId('reproduce-run').click();
  await expect(page.getByTestId('reproduce-verdict')).toHaveText('reproduced', { timeout: 60_000 });

  // Rename and retag; the workspace table finds it by the new title and by tag.
  await page.getByTestId('edit-run').click();
  await page.getByTestId('edit-run-title').fill(`${title} (checked)`);
  await page.getByTestId('edit-run-tags').fill('equilibrium, e2e, checked');
  await page.getByTestId('edit-run-submit').click();
  await expect(page.getByTestId('saved-run-title')).toHaveText(`${title} (checked)`);
  await expect(page.getByTestId('saved-run-tags')).toContainText('checked');

  await page.goto('/workspaces/larkspur');
  await page.getByTestId('runs-search').fill(`${title} (checked)`);
  await expect(page.getByTestId('runs-row')).toHaveCount(1);
  await page.getByTestId('runs-search').fill('');
  await page.getByTestId('runs-tag-filter').selectOption('checked');
  await expect(page.getByTestId('runs-row').first()).toContainText('(checked)');
  await page.getByTestId('runs-row-link').first().click();
  await expect(page).toHaveURL(url);
});

test('a viewer opens a saved run read-only: no rename, tag or delete, and no save form', async ({ page, browser }) => {
  // Saved by the editor in a context of its own.
  const editorContext = await browser.newContext();
  const editorPage = await editorContext.newPage();
  await new AuthPages(editorPage).signIn(demoPerson('editor'));
  await runH2(editorPage);
  await editorPage.getByTestId('save-run-title').fill(`for the viewer ${Date.now().toString(36)}`);
  await editorPage.getByTestId('save-run-submit').click();
  const url = (await editorPage.getByTestId('saved-run-link').getAttribute('href'))!;
  await editorContext.close();

  await new AuthPages(page).signIn(demoPerson('viewer'));
  await page.goto(url);
  await expect(page.getByTestId('saved-run-title')).toBeVisible();
  await expect(page.getByTestId('edit-run')).toHaveCount(0);
  await expect(page.getByTestId('delete-run')).toHaveCount(0);
  // The viewer can still compute in the browser, but has no workspace to save into.
  await runH2(page);
  await expect(page.getByTestId('save-run-no-workspace')).toBeVisible();
});

test('an editor deletes a run; its address is gone', async ({ page }) => {
  await new AuthPages(page).signIn(demoPerson('editor'));
  await runH2(page);
  await page.getByTestId('save-run-title').fill(`to delete ${Date.now().toString(36)}`);
  await page.getByTestId('save-run-submit').click();
  const url = (await page.getByTestId('saved-run-link').getAttribute('href'))!;
  await page.goto(url);
  page.once('dialog', (d) => void d.accept());
  await page.getByTestId('delete-run').click();
  await expect(page).toHaveURL(/\/workspaces\/larkspur$/);
  await page.goto(url);
  await expect(page.getByTestId('run-not-found')).toBeVisible();
  await expect(page.getByTestId('saved-run-title')).toHaveCount(0);
});
