import { expect, type Page } from '@playwright/test';

/** The wall screen: technician tiles, the panel with its PIN pad and tasks, clock off. */
export class WallPage {
  constructor(private readonly page: Page) {}

  /** Pairs this browser as a wall screen; the member who pairs it is signed out here. */
  async pair(name: string) {
    await this.page.goto('/wall/pair');
    await this.page.getByLabel('Name of this screen').fill(name);
    await this.page.getByRole('button', { name: 'Pair this browser' }).click();
    await expect(this.technicians()).toBeVisible();
  }

  technicians = () => this.page.getByRole('list', { name: 'Technicians' });
  tile = (name: string) => this.technicians().getByRole('button', { name, exact: true });
  panel = (name: string) => this.page.getByRole('dialog', { name });

  async enterPin(name: string, pin: string) {
    const pad = this.panel(name).getByRole('group', { name: 'PIN pad' });
    for (const digit of pin) await pad.getByRole('button', { name: digit, exact: true }).click();
  }

  /** Logs a part against the task the technician is on, from their panel. */
  async logPart(name: string, pin: string, part: string, quantity: string) {
    await this.openWithPin(name, pin);
    const panel = this.panel(name);
    await panel.getByRole('button', { name: 'Log a part' }).click();
    await panel.getByRole('button', { name: new RegExp(`^${part.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}`) }).click();
    await panel.getByLabel('Quantity').fill(quantity);
    await panel.getByRole('button', { name: /^Log / }).click();
    await expect(panel.getByRole('status').filter({ hasText: /^Logged / })).toBeVisible();
    await panel.getByRole('button', { name: 'Close' }).click();
    await expect(panel).toHaveCount(0);
  }

  async openWithPin(name: string, pin: string) {
    await this.tile(name).click();
    await this.enterPin(name, pin);
  }
}
