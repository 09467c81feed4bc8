import { apiAs } from '../api';
import { EstimateSection } from '../pages/estimate-section';
import { SignInPage } from '../pages/sign-in-page';
import { WallPage } from '../pages/wall-page';
import { DEMO, DEMO_PASSWORD, expect, test } from '../fixtures';

const PRIYA = { name: 'Priya Natarajan', pin: '246810' };
const HAMMER_SET = 'Hammer set, grand, 88';

test.use({ viewport: { width: 1920, height: 1080 } });
test.setTimeout(90_000);

test('the owner prices a job with two options, the wall logs time and a part, and the margins page shows the cost', async ({ page, browser }) => {
  const t = Math.random().toString(36).slice(2, 7);
  const owner = await apiAs(DEMO.owner);
  const stage = await owner.createStage(`Action ${t}`);
  const title = `Rehammer the salon grand ${t}`;
  const job = await owner.createJob(title, stage.id);

  // The owner builds and accepts the estimate on the job page.
  await new SignInPage(page).goto();
  await new SignInPage(page).signInAs(DEMO.owner, DEMO_PASSWORD);
  await page.goto(`/jobs/${job.id}`);
  const estimate = new EstimateSection(page);
  await estimate.start();
  await estimate.addLabour(estimate.everyVersion(), `Full regulation ${t}`, '8');
  await estimate.addChoice('Hammers', [
    { name: 'New hammers', line: `Hang new hammers ${t}`, hours: '10' },
    { name: 'Recover the old ones', line: `Recover the hammers ${t}`, hours: '6' },
  ]);
  await estimate.saveAndIssue();
  await estimate.acceptFor('New hammers');

  // Accepting turned the chosen labour lines into budgeted tasks.
  const tasks = await owner.get<{ tasks: Array<{ title: string; estimatedMinutes: number | null }> }>(`/api/jobs/${job.id}/tasks`);
  expect(tasks.tasks.map((x) => [x.title, x.estimatedMinutes])).toEqual(
    expect.arrayContaining([
      [`Full regulation ${t}`, 480],
      [`Hang new hammers ${t}`, 600],
    ]),
  );
  expect(tasks.tasks.map((x) => x.title)).not.toContain(`Recover the hammers ${t}`);

  // A delivery of one hammer set at the scenario's unit cost, so the wall has one to log.
  const parts = await owner.get<{ parts: Array<{ id: string; name: string }> }>(`/api/parts?q=${encodeURIComponent(HAMMER_SET)}`);
  const hammerSet = parts.parts.find((p) => p.name === HAMMER_SET)!;
  await owner.post(`/api/parts/${hammerSet.id}/movements`, { kind: 'received', quantityMilli: 1000, unitCostMinor: 52000 });

  const before = (await owner.get<{ money: { costToDateMinor: number; priceMinor: number } }>(`/api/jobs/${job.id}/costing`)).money;
  // Price: (8 + 10) h at the demo charge-out rate of £55/h.
  expect(before.priceMinor).toBe(18 * 5500);

  // Priya clocks on at the wall screen and logs the hammer set against the task.
  const wallContext = await browser.newContext({ viewport: { width: 1920, height: 1080 } });
  const wallPage = await wallContext.newPage();
  await new SignInPage(wallPage).goto();
  await new SignInPage(wallPage).signInAs(DEMO.foreman, DEMO_PASSWORD);
  const wall = new WallPage(wallPage);
  await wall.pair(`Action bench ${t}`);
  await wall.openWithPin(PRIYA.name, PRIYA.pin);
  await wall.panel(PRIYA.name).getByRole('button', { name: new RegExp(`^Hang new hammers ${t}`) }).click();
  await expect(wall.tile(PRIYA.name)).toHaveAccessibleDescription(new RegExp(`Hang new hammers ${t}`));
  await wall.logPart(PRIYA.name, PRIYA.pin, HAMMER_SET, '1');

  // Every member's board card shows the hours against the estimate; the owner's shows the margin too.
  await page.goto('/board');
  const card = page.getByRole('article', { name: title });
  await expect(card.getByRole('img', { name: /^Hours: .* of 18 hours estimated/ })).toBeVisible();
  await expect(card.getByRole('img', { name: /^Forecast margin/ })).toBeVisible();

  // The owner's margins page shows the job's cost to date and its forecast.
  await page.goto('/margins');
  const row = page.getByRole('row').filter({ hasText: title });
  await expect(row).toContainText('£520.00');
  const after = (await owner.get<{ money: { costToDateMinor: number; forecastCostMinor: number } }>(`/api/jobs/${job.id}/costing`)).money;
  // The hammer set's demo unit cost is £520.00 (the scenario's catalogue).
  expect(after.costToDateMinor).toBeGreaterThanOrEqual(before.costToDateMinor + 52000);
  expect(after.forecastCostMinor).toBeGreaterThan(after.costToDateMinor);

  await wall.openWithPin(PRIYA.name, PRIYA.pin);
  await wall.panel(PRIYA.name).getByRole('button', { name: 'Clock off' }).click();
  await wallContext.close();
  await owner.dispose();
});
