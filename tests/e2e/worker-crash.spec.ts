import { expect, test, type Page, type Route } from '@playwright/test';

/**
 * A solver worker that dies must not take the page with it: the status panel says what
 * happened in words, the form keeps what the user typed, and the next run works because the
 * page starts a fresh worker.
 *
 * The crash is a real uncaught exception inside a real worker. The product is unchanged; the
 * test serves the worker's own bootstrap script with one listener put in front of it, which
 * throws when the page asks the worker to run. That is what any failure inside the worker
 * looks like to the page (an `error` event on the Worker), with nothing faked on the page side.
 */

/** The worker bootstrap the page loads: found from the page's own workers, not from a file name. */
async function solverWorkerScriptUrl(page: Page): Promise<string> {
  await expect.poll(() => page.workers().length, { timeout: 20_000 }).toBeGreaterThanOrEqual(2);
  const url = new URL(page.workers()[0].url());
  url.hash = '';
  return url.toString();
}

/**
 * Prepended to the script: comlink posts `{ type: 'APPLY', path: ['run'] }` for `api.run(...)`.
 * Listeners run in the order they were added, so this one sees the call before comlink does,
 * stops it, and throws out of the event handler: an uncaught error in the worker's scope.
 */
const CRASH_ON_RUN = `self.addEventListener('message', function (event) {
  var data = event.data;
  if (data && data.type === 'APPLY' && Array.isArray(data.path) && data.path[0] === 'run') {
    event.stopImmediatePropagation();
    throw new Error('worker lost its state in the middle of a run');
  }
});
`;

test('a crash in the solver worker becomes a readable error; the inputs survive and the next run works', async ({ page }) => {
  // Every worker script request goes through here; while armed, each worker the page starts is the crashing kind.
  let armed = true;
  let served = 0;
  const handler = async (route: Route) => {
    if (!armed) return route.continue();
    const response = await route.fetch();
    served++;
    await route.fulfill({ response, body: CRASH_ON_RUN + (await response.text()) });
  };
  // Playwright turns the HTTP cache off while routing, so every new Worker asks for its script again.
  await page.route(/\/_next\/static\/.*worker.*\.js(\?.*)?$/, handler);

  await page.goto('/runs/new');
  await expect(page.getByTestId('run-builder')).toBeVisible();
  const scriptUrl = await solverWorkerScriptUrl(page);
  // Both of the page's workers (runs and live estimates) were served the crashing script.
  expect(served).toBeGreaterThanOrEqual(2);
  expect(scriptUrl).toMatch(/worker/);

  // The user sets up a run and edits fields the starter did not fill that way.
  await page.getByTestId('source-starter').click();
  await page.getByTestId('preset').selectOption('h2');
  await page.getByTestId('ci-space').selectOption('FCI');
  await page.getByTestId('title').fill('bond at 1.4 bohr, kept through a crash');
  await page.getByTestId('roots').fill('2');
  // The estimate worker answers as usual: it is never asked to run. H2 FCI: C(2,1)² = 4 determinants (analytic count).
  await expect(page.getByTestId('estimate-determinants')).toHaveAttribute('data-value', '4', { timeout: 20_000 });

  // From here on, a worker the page starts gets the product's own script.
  armed = false;
  await page.getByTestId('run-button').click();

  const failure = page.getByTestId('run-failure');
  await expect(failure).toBeVisible({ timeout: 20_000 });
  await expect(failure).toHaveAttribute('data-code', 'crash');
  await expect(failure).toHaveAttribute('role', 'alert');
  await expect(failure).toContainText('The solver crashed.');
  await expect(failure).toContainText('worker lost its state in the middle of a run'); // the worker's own message, passed on
  await expect(failure).toContainText('Your inputs are kept');
  await expect(page.getByTestId('run-status')).toHaveAttribute('data-status', 'failed');
  await expect(page.getByTestId('results')).toHaveCount(0);

  // Not a blank page: the form is there with what the user typed, and Run is on again.
  await expect(page.getByTestId('run-builder')).toBeVisible();
  await expect(page.getByTestId('title')).toHaveValue('bond at 1.4 bohr, kept through a crash');
  await expect(page.getByTestId('roots')).toHaveValue('2');
  await expect(page.getByTestId('ci-space')).toHaveValue('FCI');
  await expect(page.getByTestId('run-button')).toBeEnabled();

  // The page started a fresh worker for runs; the next run goes through it.
  await page.getByTestId('run-button').click();
  const cell = page.getByTestId('energy-root-0');
  await expect(cell).toBeVisible({ timeout: 60_000 });
  await expect(page.getByTestId('run-status')).toHaveAttribute('data-status', 'done');
  await expect(page.getByTestId('run-failure')).toHaveCount(0);
  // from memory of Szabo & Ostlund (1996) §4.3: H2 STO-3G full CI at R = 1.4 bohr ≈ −1.1373 hartree
  expect(Number(await cell.getAttribute('data-value'))).toBeCloseTo(-1.1373, 3);
  await expect(page.getByTestId('energy-root-1')).toBeVisible(); // the edited roots = 2 was used
  await expect(page.getByTestId('title')).toHaveValue('bond at 1.4 bohr, kept through a crash');
});

test('a solver worker that cannot start is reported, not restarted in a loop, and works once it can start', async ({ page }) => {
  // While broken, every worker script the page asks for throws as it loads (as a stale or damaged deployment would).
  let broken = true;
  let requests = 0;
  await page.route(/\/_next\/static\/.*worker.*\.js(\?.*)?$/, async (route) => {
    requests++;
    if (!broken) return route.continue();
    await route.fulfill({ status: 200, contentType: 'text/javascript', body: "throw new Error('this copy of the solver cannot start');" });
  });

  await page.goto('/runs/new');
  await expect(page.getByTestId('run-builder')).toBeVisible();
  await page.getByTestId('source-starter').click();
  await page.getByTestId('preset').selectOption('h2');
  await page.getByTestId('ci-space').selectOption('FCI');
  await page.getByTestId('title').fill('waiting for a working solver');

  // The live estimate says the solver failed, in words, instead of counting forever.
  await expect(page.getByTestId('estimate-error')).toContainText('The solver stopped unexpectedly', { timeout: 20_000 });
  await expect(page.getByTestId('estimate-error')).toContainText('cannot start');

  // Nothing keeps restarting the dead worker behind the user's back.
  const settled = requests;
  await page.waitForTimeout(2_000);
  expect(requests).toBe(settled);

  // Run starts a worker for itself, which fails the same way: a readable crash message, the form intact.
  await page.getByTestId('run-button').click();
  await expect(page.getByTestId('run-failure')).toHaveAttribute('data-code', 'crash', { timeout: 20_000 });
  await expect(page.getByTestId('run-failure')).toContainText('cannot start');
  await expect(page.getByTestId('title')).toHaveValue('waiting for a working solver');

  // Once the script loads again, the next change is estimated and the next run works.
  broken = false;
  await page.getByTestId('roots').fill('1');
  await page.getByTestId('title').fill('solver back');
  await expect(page.getByTestId('estimate-determinants')).toHaveAttribute('data-value', '4', { timeout: 20_000 }); // C(2,1)² (analytic count)
  await page.getByTestId('run-button').click();
  const cell = page.getByTestId('energy-root-0');
  await expect(cell).toBeVisible({ timeout: 60_000 });
  // from memory of Szabo & Ostlund (1996) §4.3: H2 STO-3G full CI at R = 1.4 bohr ≈ −1.1373 hartree
  expect(Number(await cell.getAttribute('data-value'))).toBeCloseTo(-1.1373, 3);
});
