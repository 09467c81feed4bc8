import { expect, type Page } from '@playwright/test';

export class SignInPage {
  constructor(private readonly page: Page) {}

  async goto() {
    await this.page.goto('/sign-in');
    await expect(this.page.getByRole('heading', { level: 1 })).toBeVisible();
  }

  async signIn(email: string, password: string) {
    await this.page.getByLabel('E-mail').fill(email);
    await this.page.getByLabel('Password', { exact: true }).fill(password);
    await this.page.getByRole('button', { name: 'Sign in' }).click();
  }

  /** Signs in and waits until the signed-in layout shows. */
  async signInAs(email: string, password: string) {
    await this.signIn(email, password);
    await expect(this.page.getByRole('button', { name: 'Sign out' })).toBeVisible();
  }
}
