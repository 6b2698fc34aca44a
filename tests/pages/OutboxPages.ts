import { expect, type Page } from '@playwright/test';

/** The admin outbox: find the newest mail to an address, open it, return its first link. */
export class OutboxPages {
  constructor(private readonly page: Page) {}

  async openLatestTo(email: string) {
    await this.page.goto('/admin/outbox');
    // The list polls the server, so a mail that is still on its way shows up without a reload.
    const row = this.page.getByTestId('outbox-row').filter({ has: this.page.getByTestId('outbox-to').getByText(email, { exact: false }) }).first();
    await expect(row).toBeVisible({ timeout: 20_000 });
    await row.getByTestId('outbox-open').click();
    await expect(this.page.getByTestId('mail-to')).toContainText(email, { timeout: 20_000 });
  }

  async firstLinkHref(): Promise<string> {
    const href = await this.page.getByTestId('mail-link').first().getAttribute('href');
    if (!href) throw new Error('the mail has no link');
    return href;
  }
}
