/**
 * The main thread during a run in the browser: every task over 50 ms that Chromium reports
 * through the Long Tasks API (`PerformanceObserver`, entry type "longtask", which by its
 * definition lists each task of 50 ms or more) while the run page computes a run in its
 * worker, from the click on Run until the results are on screen. Printed as figures; nothing
 * passes or fails here.
 *
 * The app comes from KETBOOK_BENCH_URL when set; otherwise this starts a copy the way the
 * demo starts (db/scripts/start.sh on free ports: the demo's database, a build when the tree
 * has changed) and stops it afterwards by its PID. Without a browser or a build it prints a
 * "skipped" line and the rest of the benchmark stands.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync } from 'node:fs';
import { createServer } from 'node:net';
import path from 'node:path';
import type { Page } from '@playwright/test';

const CHROMIUM = '/usr/bin/chromium';
const DEMO_URL = 'http://127.0.0.1:3000';
const repoRoot = path.resolve(__dirname, '../..');

/** Starter systems of the run page (components/run/presets.ts) and what each run exercises. */
const CASES: { preset: string; label: string }[] = [
  { preset: 'h4-square', label: 'H4 square FCI (dense)' },
  { preset: 'lih', label: 'LiH 3.015 bohr FCI (dense)' },
  { preset: 'h10-chain', label: 'H10 chain FCI (Davidson, 63,504 det.)' },
];

interface LongTask {
  startMs: number;
  durationMs: number;
}

declare global {
  interface Window {
    __ketbookLongTasks?: LongTask[];
  }
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

async function healthy(url: string): Promise<boolean> {
  try {
    const response = await fetch(`${url}/api/health`, { signal: AbortSignal.timeout(2000) });
    const body = (await response.json().catch(() => ({}))) as { database?: string };
    return response.ok && body.database === 'up';
  } catch {
    return false;
  }
}

/** A copy of the app as `npm start` runs it, on ports nobody else uses; its output is kept for a failure message. */
async function startApp(): Promise<{ url: string; child: ChildProcess; stop: () => Promise<void> } | { skipped: string }> {
  const port = await freePort();
  const smtpPort = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const child = spawn('bash', ['db/scripts/start.sh'], {
    cwd: repoRoot,
    env: { ...process.env, PORT: String(port), KETBOOK_SMTP_PORT: String(smtpPort), KETBOOK_PUBLIC_URL: url },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  child.stdout?.on('data', (chunk) => (output = (output + chunk).slice(-4000)));
  child.stderr?.on('data', (chunk) => (output = (output + chunk).slice(-4000)));
  let exited = false;
  child.once('exit', () => (exited = true));
  const stop = async () => {
    if (exited) return;
    // start.sh stops what it started (web server, mail server, a database it launched) on TERM.
    child.kill('SIGTERM');
    await new Promise<void>((resolve) => {
      const timer = setTimeout(() => {
        if (!exited) child.kill('SIGKILL');
        resolve();
      }, 30_000);
      child.once('exit', () => {
        clearTimeout(timer);
        resolve();
      });
    });
  };
  // A build on this machine takes minutes; allow 15.
  const deadline = Date.now() + 15 * 60_000;
  while (Date.now() < deadline) {
    if (exited) {
      const lastLine = output.trim().split('\n').slice(-3).join(' | ');
      return { skipped: `the app did not start (db/scripts/start.sh exited: ${lastLine || 'no output'})` };
    }
    if (await healthy(url)) return { url, child, stop };
    await new Promise((r) => setTimeout(r, 1000));
  }
  await stop();
  return { skipped: 'the app did not answer /api/health within 15 minutes' };
}

/** Registered before any page script, so tasks from the first one on are seen. */
function observeLongTasks() {
  window.__ketbookLongTasks = [];
  new PerformanceObserver((list) => {
    for (const entry of list.getEntries()) window.__ketbookLongTasks!.push({ startMs: entry.startTime, durationMs: entry.duration });
  }).observe({ type: 'longtask', buffered: true });
}

async function measureRun(page: Page, baseUrl: string, preset: string) {
  await page.goto(`${baseUrl}/runs/new`);
  await page.getByTestId('source-starter').click();
  await page.getByTestId('preset').selectOption(preset);
  await page.getByTestId('estimate').and(page.locator('[data-state="within"]')).waitFor({ timeout: 60_000 });
  // Let the page go quiet so loading and typing are not counted as the run's.
  await page.waitForTimeout(1000);
  const startMs = await page.evaluate(() => performance.now());
  await page.getByTestId('run-button').click();
  await page.locator('[data-testid="run-status"][data-status="done"]').waitFor({ timeout: 10 * 60_000 });
  await page.getByTestId('energy-root-0').waitFor({ timeout: 60_000 });
  // Two frames after the results appear: their first paint belongs to the run.
  const endMs = await page.evaluate(
    () => new Promise<number>((resolve) => requestAnimationFrame(() => requestAnimationFrame(() => resolve(performance.now())))),
  );
  // Entries are delivered after a task ends; give the observer a moment.
  await page.waitForTimeout(300);
  const tasks = (await page.evaluate(() => window.__ketbookLongTasks ?? [])).filter((t) => t.startMs + t.durationMs >= startMs && t.startMs <= endMs);
  const energy = Number(await page.getByTestId('energy-root-0').getAttribute('data-value'));
  // The count the run itself reported (the estimate panel may still show the previous system's).
  const determinants = Number((await page.getByTestId('progress-determinants').innerText()).replace(/[^0-9]/g, ''));
  return { determinants, wallMs: endMs - startMs, tasks, energy };
}

export async function benchLongTasks(): Promise<void> {
  console.log('\nMain thread during a run in the browser (Long Tasks API, Chromium):');
  if (!existsSync(CHROMIUM)) {
    console.log(`  skipped: ${CHROMIUM} is not installed (apt-get install chromium)`);
    return;
  }
  let app: Awaited<ReturnType<typeof startApp>> | null = null;
  let baseUrl = process.env.KETBOOK_BENCH_URL?.replace(/\/$/, '');
  if (!baseUrl && (await healthy(DEMO_URL))) {
    // Building a second copy would rewrite the demo's .next under its running server.
    console.log(`  using the demo already running at ${DEMO_URL} (set KETBOOK_BENCH_URL to choose another copy)`);
    baseUrl = DEMO_URL;
  }
  if (!baseUrl) {
    console.log('  starting the app (db/scripts/start.sh; builds first when the tree has changed) …');
    app = await startApp();
    if ('skipped' in app) {
      console.log(`  skipped: ${app.skipped}`);
      return;
    }
    baseUrl = app.url;
  } else if (!(await healthy(baseUrl))) {
    console.log(`  skipped: KETBOOK_BENCH_URL ${baseUrl} does not answer /api/health`);
    return;
  }
  const { chromium } = await import('@playwright/test');
  const browser = await chromium
    .launch({
      executablePath: CHROMIUM,
      headless: true,
      args: ['--no-sandbox', '--disable-gpu', '--disable-dev-shm-usage', '--disable-background-networking', '--no-first-run'],
    })
    .catch((error: unknown) => error as Error);
  if (browser instanceof Error) {
    console.log(`  skipped: chromium did not start (${browser.message.split('\n')[0]})`);
    if (app && !('skipped' in app)) await app.stop();
    return;
  }
  try {
    for (const { preset, label } of CASES) {
      const page = await browser.newPage();
      await page.addInitScript(observeLongTasks);
      try {
        const { determinants, wallMs, tasks, energy } = await measureRun(page, baseUrl, preset);
        const longest = tasks.reduce((m, t) => Math.max(m, t.durationMs), 0);
        // Total blocking time: the part of each long task beyond 50 ms (the Long Tasks threshold).
        const blockingMs = tasks.reduce((s, t) => s + Math.max(0, t.durationMs - 50), 0);
        console.log(
          `  ${label.padEnd(40)} ${String(determinants).padStart(7)} det.  run ${(wallMs / 1000).toFixed(2).padStart(6)} s  ` +
            `long tasks ${String(tasks.length).padStart(2)} (> 50 ms)  longest ${longest.toFixed(0).padStart(4)} ms  ` +
            `blocking ${blockingMs.toFixed(0).padStart(4)} ms  E = ${energy.toFixed(10)}`,
        );
      } catch (error) {
        console.log(`  ${label.padEnd(40)} skipped: ${error instanceof Error ? error.message.split('\n')[0] : String(error)}`);
      } finally {
        await page.close();
      }
    }
  } finally {
    await browser.close();
    if (app && !('skipped' in app)) await app.stop();
  }
}

// `npx tsx tests/bench/longTasks.ts` runs this part alone.
if (require.main === module) {
  benchLongTasks().catch((error) => {
    console.error(error);
    process.exitCode = 1;
  });
}
