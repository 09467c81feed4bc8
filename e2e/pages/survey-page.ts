import { expect, type Page } from '@playwright/test';

/** A 1×1 PNG: enough for the server to read, resize and strip. */
const TINY_PNG = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==', 'base64');

/** The condition survey on a tablet: components by area, grades, photos, the summary. */
export class SurveyPage {
  constructor(private readonly page: Page) {}

  async start(pianoId: string, place: string) {
    await this.page.goto(`/pianos/${pianoId}/surveys/new`);
    await this.page.getByLabel('Place').fill(place);
    await this.page.getByRole('button', { name: 'Start the survey' }).click();
    await expect(this.page).toHaveURL(/\/surveys\/[0-9a-f-]{36}$/);
  }

  component = (name: string) => this.page.getByRole('region', { name, exact: true });

  async grade(component: string, grade: 'Sound' | 'Serviceable' | 'Needs work' | 'Replace') {
    const region = this.component(component);
    await region.getByRole('group', { name: `Grade for ${component}` }).getByRole('button', { name: grade, exact: true }).click();
    await expect(region.getByRole('status').first()).toHaveText('Saved');
  }

  async addPhotos(component: string, count: number) {
    const files = Array.from({ length: count }, (_, i) => ({ name: `photo-${i + 1}.png`, mimeType: 'image/png', buffer: TINY_PNG }));
    await this.page.getByLabel(`Add photos of ${component}`).setInputFiles(files);
    await expect(this.page.getByRole('list', { name: `Photos of ${component}` }).getByRole('img')).toHaveCount(count);
  }

  async summarise(condition: string, work: string, choice: string, alternatives: [string, string]) {
    const summary = this.component('Summary');
    await summary.getByLabel('Overall condition').fill(condition);
    await summary.getByLabel('Recommended work').fill(work);
    await summary.getByRole('button', { name: 'Add a choice for the client' }).click();
    await summary.getByLabel('What the client decides').fill(choice);
    await summary.getByLabel('Alternative 1').fill(alternatives[0]);
    await summary.getByLabel('Alternative 2').fill(alternatives[1]);
    await expect(summary.getByRole('status').first()).toHaveText('Saved');
  }
}
