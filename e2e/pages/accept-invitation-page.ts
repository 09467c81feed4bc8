import type { Page } from '@playwright/test';

export class AcceptInvitationPage {
  constructor(private readonly page: Page) {}

  async accept(name: string, password: string) {
    await this.page.getByLabel('Your name').fill(name);
    await this.page.getByLabel('Choose a password').fill(password);
    await this.page.getByRole('button', { name: 'Join workshop' }).click();
  }
}
