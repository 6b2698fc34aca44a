import { expect, test } from '@playwright/test';
import { AuthPages } from '../pages/AuthPages';
import { OutboxPages } from '../pages/OutboxPages';
import { WorkspacePages } from '../pages/WorkspacePages';
import { demoAdmin } from './demoCredentials';

const suffix = `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;
const owner = { email: `owner-${suffix}@e2e.example`, displayName: `Owner ${suffix}`, password: `owner-pass-${suffix}` };
const colleague = { email: `colleague-${suffix}@e2e.example`, displayName: `Colleague ${suffix}`, password: `colleague-pass-${suffix}` };
const workspace = { name: `Test Group ${suffix}`, slug: `test-group-${suffix}` };

test('sign up, create a workspace, invite by e-mail, accept from the outbox link, viewer cannot create projects', async ({ page }) => {
  const auth = new AuthPages(page);
  const workspaces = new WorkspacePages(page);

  await auth.signUp(owner);
  await expect(page).toHaveURL(/\/workspaces$/);
  await auth.signOut();
  await auth.signIn(owner);

  await workspaces.create(workspace);
  await expect(workspaces.memberRole(owner.email)).toHaveValue('owner');
  await workspaces.invite({ email: colleague.email, role: 'viewer' });
  await auth.signOut();

  await auth.signIn(demoAdmin());
  const outbox = new OutboxPages(page);
  await outbox.openLatestTo(colleague.email);
  const link = await outbox.firstLinkHref();
  expect(link).toContain('/invitations/accept?token=');
  await auth.signOut();

  // The mail's link names the public URL; follow its path on the server under test.
  const url = new URL(link);
  await page.goto(url.pathname + url.search);
  await expect(page.getByTestId('page-title')).toHaveText(`Join ${workspace.name}`);
  await page.getByTestId('invitation-sign-up').click();
  await expect(page.getByTestId('sign-up-email')).toHaveValue(colleague.email);
  await auth.fillSignUp({ displayName: colleague.displayName, password: colleague.password });

  await expect(page).toHaveURL(new RegExp(`/workspaces/${workspace.slug}$`));
  await expect(page.getByTestId('page-title')).toHaveText(workspace.name);
  await expect(page.getByTestId('workspace-access')).toContainText('viewer');
  await expect(page.getByTestId(`member-${colleague.email}`)).toBeVisible();

  // Viewers see projects read-only: no form, and the API refuses a direct request.
  await expect(page.getByTestId('workspace-projects')).toBeVisible();
  await expect(workspaces.createProjectForm()).toHaveCount(0);
  const response = await page.request.post(`/api/workspaces/${workspace.slug}/projects`, { data: { name: 'Not allowed' } });
  expect(response.status()).toBe(403);
  const body = await response.json();
  expect(body.error.code).toBe('forbidden:workspace');
});
