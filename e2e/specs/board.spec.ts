import { apiAs } from '../api';
import { BoardPage } from '../pages/board-page';
import { SignInPage } from '../pages/sign-in-page';
import { DEMO, DEMO_PASSWORD, expect, test, uniqueEmail } from '../fixtures';

const tag = () => Math.random().toString(36).slice(2, 7);

test.describe('the board', () => {
  test('the foreman drags a card to another stage with the mouse; a second screen sees it without reloading', async ({ page, browser }) => {
    const t = tag();
    const api = await apiAs(DEMO.foreman);
    const from = await api.createStage(`Soundboard ${t}`);
    const to = await api.createStage(`Bridges ${t}`);
    const title = `Crack repair ${t}`;
    await api.createJob(title, from.id);

    await new SignInPage(page).goto();
    await new SignInPage(page).signInAs(DEMO.foreman, DEMO_PASSWORD);
    const board = new BoardPage(page);
    await board.goto();

    const watcher = await browser.newContext();
    const watcherPage = await watcher.newPage();
    await new SignInPage(watcherPage).goto();
    await new SignInPage(watcherPage).signInAs(DEMO.technician, DEMO_PASSWORD);
    const watcherBoard = new BoardPage(watcherPage);
    await watcherBoard.goto();
    await expect(watcherBoard.cards(from.name).filter({ hasText: title })).toHaveCount(1);

    await board.dragWithMouse(title, to.name);
    // The first board after a cold start can take a moment on a busy machine.
    await expect(board.cards(to.name).filter({ hasText: title })).toHaveCount(1, { timeout: 10_000 });
    await expect(watcherBoard.cards(to.name).filter({ hasText: title })).toHaveCount(1);
    await expect(watcherBoard.cards(from.name)).toHaveCount(0);

    const job = (await api.get<{ stages: Array<{ name: string; jobs: Array<{ title: string }> }> }>('/api/board')).stages.find((s) => s.name === to.name);
    expect(job?.jobs.map((j) => j.title)).toEqual([title]);
    await watcher.close();
    await api.dispose();
  });

  test('the owner reorders cards within a stage with the keyboard alone', async ({ page }) => {
    const t = tag();
    const api = await apiAs(DEMO.owner);
    const stage = await api.createStage(`Keyframe ${t}`);
    const first = `Ease keys ${t}`;
    const second = `Level keys ${t}`;
    await api.createJob(first, stage.id);
    await api.createJob(second, stage.id);

    await new SignInPage(page).goto();
    await new SignInPage(page).signInAs(DEMO.owner, DEMO_PASSWORD);
    const board = new BoardPage(page);
    await board.goto();
    await expect(board.cards(stage.name).nth(0)).toHaveAccessibleName(first);

    await board.handle(second).scrollIntoViewIfNeeded();
    await board.handle(second).focus();
    await page.keyboard.press('Space');
    await expect(board.liveRegion()).toContainText(`${second} is in ${stage.name}, position 2 of 2`);
    await page.keyboard.press('ArrowUp');
    await expect(board.liveRegion()).toContainText('position 1 of 2');
    await page.keyboard.press('Space');

    await expect(board.cards(stage.name).nth(0)).toHaveAccessibleName(second);
    await expect(board.cards(stage.name).nth(1)).toHaveAccessibleName(first);
    await expect.poll(async () => {
      const board = await api.get<{ stages: Array<{ id: string; jobs: Array<{ title: string }> }> }>('/api/board');
      return board.stages.find((s) => s.id === stage.id)?.jobs.map((j) => j.title);
    }).toEqual([second, first]);

    // Escape puts a lifted card back where it was.
    await board.handle(first).focus();
    await page.keyboard.press('Space');
    await expect(board.liveRegion()).toContainText(`${first} is in ${stage.name}, position 2 of 2`);
    await page.keyboard.press('ArrowUp');
    await expect(board.liveRegion()).toContainText('position 1 of 2');
    await page.keyboard.press('Escape');
    await expect(board.liveRegion()).toContainText(`${first} is back in ${stage.name}`);
    await expect(board.cards(stage.name).nth(1)).toHaveAccessibleName(first);
    await api.dispose();
  });

  test('a move the server refuses goes back on screen with a clear message', async ({ page }) => {
    const t = tag();
    const owner = await apiAs(DEMO.owner);
    const from = await owner.createStage(`Dampers ${t}`);
    const to = await owner.createStage(`Trapwork ${t}`);
    const title = `New damper felts ${t}`;
    await owner.createJob(title, from.id);

    // A foreman who is made a technician while their board is open: the server now refuses moves.
    const email = uniqueEmail('foreman');
    await owner.post('/api/team/invitations', { email, role: 'foreman' });
    const { waitForMail, linkIn } = await import('../fixtures');
    const mail = await waitForMail(owner.context, email);
    const token = linkIn(mail, 'invitations').split('/').pop();
    await page.request.post('/api/invitations/accept', { data: { token, name: 'Relief Foreman', password: 'relief foreman 1' } });
    const board = new BoardPage(page);
    await board.goto();
    await expect(board.handle(title)).toBeVisible();

    const members = await owner.get<{ members: Array<{ id: string; email: string }> }>('/api/team/members');
    const member = members.members.find((m) => m.email === email)!;
    await owner.patch(`/api/team/members/${member.id}`, { role: 'technician' });

    await board.dragWithMouse(title, to.name);
    await expect(page.getByRole('region', { name: 'Notifications' })).toContainText('stayed where it was');
    await expect(board.cards(from.name).filter({ hasText: title })).toHaveCount(1, { timeout: 10_000 });
    await expect(board.cards(to.name)).toHaveCount(0, { timeout: 10_000 });
    await owner.dispose();
  });
});
