import { expect, type Locator, type Page } from '@playwright/test';

/** The Estimate section of a job page: the draft editor, issue and accept. */
export class EstimateSection {
  constructor(private readonly page: Page) {}

  draft = (revision = 1) => this.page.getByRole('form', { name: `Draft of estimate ${revision}` });

  async start() {
    await this.page.getByRole('button', { name: 'Start an estimate' }).click();
    await expect(this.draft()).toBeVisible();
  }

  /** Adds a labour line inside `scope` (the always-included region or an option's group). */
  async addLabour(scope: Locator, description: string, hours: string) {
    await scope.getByRole('button', { name: 'Add labour' }).click();
    const line = scope.getByRole('group', { name: /^Line \d+, labour/ }).last();
    await line.getByLabel('Description').fill(description);
    await line.getByLabel('Hours').fill(hours);
  }

  everyVersion = () => this.draft().getByRole('region', { name: 'Included in every version' });

  /** Adds a choice with two options and one labour line in each. */
  async addChoice(choice: string, options: Array<{ name: string; line: string; hours: string }>) {
    await this.draft().getByRole('button', { name: 'Add a choice for the client' }).click();
    const fieldset = this.draft().getByRole('group', { name: /Client’s choice/ }).last();
    await fieldset.getByLabel('What the client chooses').fill(choice);
    const names = fieldset.getByLabel('Option name');
    for (const [index, option] of options.entries()) await names.nth(index).fill(option.name);
    for (const option of options) {
      await this.addLabour(this.draft().getByRole('group', { name: `Option: ${option.name}` }), option.line, option.hours);
    }
  }

  async saveAndIssue() {
    await this.draft().getByRole('button', { name: 'Save draft' }).click();
    await this.draft().getByRole('button', { name: 'Issue estimate' }).click();
    await this.page.getByRole('dialog').getByRole('button', { name: 'Issue estimate' }).click();
    await expect(this.page.getByRole('button', { name: 'Accept for the client' })).toBeVisible();
  }

  async acceptFor(optionName: string) {
    await this.page.getByRole('button', { name: 'Accept for the client' }).click();
    const dialog = this.page.getByRole('dialog');
    await dialog.getByRole('radio', { name: optionName }).check();
    await dialog.getByRole('button', { name: 'Accept for the client' }).click();
    await expect(dialog).toHaveCount(0);
  }
}
