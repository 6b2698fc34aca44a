import { expect, type Page } from '@playwright/test';

/** The workspace list, the create form and one workspace's page. */
export class WorkspacePages {
  constructor(private readonly page: Page) {}

  async create({ name, slug }: { name: string; slug: string }) {
    await this.page.goto('/workspaces/new');
    await this.page.getByTestId('workspace-name').fill(name);
    await this.page.getByTestId('workspace-slug').fill(slug);
    await this.page.getByTestId('create-workspace-submit').click();
    await expect(this.page).toHaveURL(new RegExp(`/workspaces/${slug}$`));
    await expect(this.page.getByTestId('page-title')).toHaveText(name);
  }

  async open(slug: string) {
    await this.page.goto(`/workspaces/${slug}`);
  }

  async invite({ email, role }: { email: string; role: 'owner' | 'editor' | 'viewer' }) {
    await this.page.getByTestId('invite-email').fill(email);
    await this.page.getByTestId('invite-role').selectOption(role);
    await this.page.getByTestId('invite-submit').click();
    await expect(this.page.getByTestId(`invitation-${email}`)).toBeVisible();
  }

  memberRole(email: string) {
    return this.page.getByTestId(`member-role-${email}`);
  }

  createProjectForm() {
    return this.page.getByTestId('create-project-form');
  }
}
