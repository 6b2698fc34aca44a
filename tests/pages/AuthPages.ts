import { expect, type Page } from '@playwright/test';

/** Sign-up, sign-in and sign-out through the real forms. */
export class AuthPages {
  constructor(private readonly page: Page) {}

  async signUp({ email, displayName, password }: { email: string; displayName: string; password: string }) {
    await this.page.goto('/sign-up');
    await this.fillSignUp({ email, displayName, password });
  }

  /** Fills the sign-up form already on screen (e.g. reached from an invitation link). */
  async fillSignUp({ email, displayName, password }: { email?: string; displayName: string; password: string }) {
    if (email !== undefined) await this.page.getByTestId('sign-up-email').fill(email);
    await this.page.getByTestId('sign-up-name').fill(displayName);
    await this.page.getByTestId('sign-up-password').fill(password);
    await this.page.getByTestId('sign-up-submit').click();
  }

  async signIn({ email, password }: { email: string; password: string }) {
    await this.page.goto('/sign-in');
    await this.page.getByTestId('sign-in-email').fill(email);
    await this.page.getByTestId('sign-in-password').fill(password);
    await this.page.getByTestId('sign-in-submit').click();
    await expect(this.page).toHaveURL(/\/workspaces$/);
  }

  async signOut() {
    await this.page.goto('/sign-out');
    await this.page.getByTestId('sign-out-button').click();
    await expect(this.page.getByTestId('nav-sign-in')).toBeVisible();
  }
}
