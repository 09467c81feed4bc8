import { apiAs } from '../api';
import { SignInPage } from '../pages/sign-in-page';
import { WallPage } from '../pages/wall-page';
import { DEMO, DEMO_PASSWORD, expect, test } from '../fixtures';

const PRIYA = { name: 'Priya Natarajan', pin: '246810' };
const DECLAN = { name: 'Declan Moss' };

test.use({ viewport: { width: 1920, height: 1080 } });

test('a paired wall screen clocks a technician on by PIN, shows it live, and clocks off', async ({ page, browser }) => {
  const t = Math.random().toString(36).slice(2, 7);
  const foreman = await apiAs(DEMO.foreman);
  const stage = await foreman.createStage(`Voicing ${t}`);
  const job = await foreman.createJob(`Voice the treble ${t}`, stage.id);
  const priya = (await foreman.get<{ technicians: Array<{ id: string; name: string }> }>('/api/technicians')).technicians.find((x) => x.name === PRIYA.name)!;
  const taskTitle = `Needle the treble hammers ${t}`;
  await foreman.post(`/api/jobs/${job.id}/tasks`, { title: taskTitle, assigneeIds: [priya.id], estimatedMinutes: 120 });

  await new SignInPage(page).goto();
  await new SignInPage(page).signInAs(DEMO.foreman, DEMO_PASSWORD);
  const wall = new WallPage(page);
  await wall.pair(`Bench room ${t}`);

  await wall.openWithPin(PRIYA.name, PRIYA.pin);
  await wall.panel(PRIYA.name).getByRole('button', { name: new RegExp(`^${taskTitle}`) }).click();
  await expect(wall.tile(PRIYA.name)).toHaveAccessibleDescription(new RegExp(taskTitle));

  // The owner's job page shows who is on the task, without reloading.
  const office = await browser.newContext();
  const officePage = await office.newPage();
  await new SignInPage(officePage).goto();
  await new SignInPage(officePage).signInAs(DEMO.owner, DEMO_PASSWORD);
  await officePage.goto(`/jobs/${job.id}`);
  const taskRow = officePage.getByRole('list', { name: 'Tasks' }).getByRole('listitem').filter({ hasText: taskTitle });
  await expect(taskRow).toContainText(`${PRIYA.name} on it now`);

  await wall.openWithPin(PRIYA.name, PRIYA.pin);
  await wall.panel(PRIYA.name).getByRole('button', { name: 'Clock off' }).click();
  await expect(wall.tile(PRIYA.name)).not.toHaveAccessibleDescription(new RegExp(taskTitle));
  await expect(taskRow).not.toContainText('on it now');

  const entries = await foreman.get<{ entries: Array<{ task: { title: string }; endedAt: string | null }> }>(`/api/time/entries?technicianId=${priya.id}`);
  const mine = entries.entries.filter((e) => e.task.title === taskTitle);
  expect(mine).toHaveLength(1);
  expect(mine[0]!.endedAt).not.toBeNull();
  await office.close();
  await foreman.dispose();
});

test('five wrong PINs lock the technician at the wall and say so plainly', async ({ page }) => {
  // Start from an unlocked PIN, so the journey can run again against the same database.
  const foreman = await apiAs(DEMO.foreman);
  const declan = (await foreman.get<{ technicians: Array<{ membershipId: string; name: string }> }>('/api/technicians')).technicians.find((x) => x.name === DECLAN.name)!;
  await foreman.post(`/api/team/members/${declan.membershipId}/unlock-pin`, {});
  await foreman.dispose();
  await new SignInPage(page).goto();
  await new SignInPage(page).signInAs(DEMO.foreman, DEMO_PASSWORD);
  const wall = new WallPage(page);
  await wall.pair(`Finishing room ${Math.random().toString(36).slice(2, 6)}`);

  await wall.tile(DECLAN.name).click();
  for (let attempt = 1; attempt <= 5; attempt += 1) {
    await wall.enterPin(DECLAN.name, '000000');
    const alert = wall.panel(DECLAN.name).getByRole('alert');
    if (attempt < 5) await expect(alert).toContainText(`${5 - attempt} tr`);
    else await expect(alert).toContainText(/Locked for 5 minutes/);
  }
});
