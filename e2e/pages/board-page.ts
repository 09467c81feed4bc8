import { expect, type Page } from '@playwright/test';

/** The board: one region per stage, one article per job, a move handle per card for writers. */
export class BoardPage {
  constructor(private readonly page: Page) {}

  async goto() {
    await this.page.goto('/board');
    await expect(this.page.getByRole('heading', { level: 1 })).toBeVisible();
  }

  column = (stage: string) => this.page.getByRole('region', { name: stage, exact: true });
  cards = (stage: string) => this.page.getByRole('list', { name: `Jobs in ${stage}` }).getByRole('article');
  card = (title: string) => this.page.getByRole('article', { name: title });
  /** Where the board tells screen readers what a drag is doing. */
  liveRegion = () => this.page.locator('[id^="DndLiveRegion"]');
  handle = (title: string) => this.page.getByRole('button', { name: `Move ${title}` });

  async expectOrder(stage: string, titles: string[]) {
    await expect(this.cards(stage)).toHaveCount(titles.length);
    for (const [index, title] of titles.entries()) {
      await expect(this.cards(stage).nth(index)).toHaveAccessibleName(title);
    }
  }

  /** Drags a card with the mouse onto another stage's column, in small steps as a hand would. */
  async dragWithMouse(title: string, toStage: string) {
    const card = this.card(title);
    // Wait until the card is complete (its hours are the last thing a card shows) so nothing moves mid-drag.
    await expect(card.getByRole('img', { name: /^Hours:/ })).toBeVisible();
    await expect(this.column(toStage)).toBeVisible();
    await card.scrollIntoViewIfNeeded();
    const from = (await card.boundingBox())!;
    await this.page.mouse.move(from.x + from.width / 2, from.y + 12);
    await this.page.mouse.down();
    await this.page.mouse.move(from.x + from.width / 2 + 10, from.y + 20, { steps: 4 });
    const target = this.column(toStage);
    const to = (await target.boundingBox())!;
    await this.page.mouse.move(to.x + to.width / 2, to.y + Math.min(to.height / 2, 120), { steps: 12 });
    await this.page.mouse.up();
  }
}
