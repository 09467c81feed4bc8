import { expect, type Page } from '@playwright/test';

export class TeamPage {
  constructor(private readonly page: Page) {}

  async goto() {
    await this.page.goto('/team');
    await expect(this.page.getByRole('heading', { name: 'Team', level: 1 })).toBeVisible();
  }

  async invite(email: string, role: 'owner' | 'foreman' | 'technician') {
    const section = this.page.getByRole('region', { name: 'Invite someone' });
    await section.getByLabel('E-mail').fill(email);
    await section.getByLabel('Role', { exact: true }).selectOption(role);
    await section.getByRole('button', { name: 'Send invitation' }).click();
    await expect(this.page.getByLabel('Pending invitations')).toContainText(email);
  }
}
