import { expect, type Page } from '@playwright/test';

/** The signed-in layout: header with the workshop, main navigation, sign-out. */
export class AppShell {
  constructor(private readonly page: Page) {}

  readonly nav = () => this.page.getByRole('navigation', { name: 'Main' });

  async expectWorkshop(name: string) {
    await expect(this.page.getByRole('banner')).toContainText(name);
  }

  async signOut() {
    await this.page.getByRole('button', { name: 'Sign out' }).click();
    await expect(this.page).toHaveURL(/\/sign-in/);
  }
}
