import { apiAs } from '../api';
import { SignInPage } from '../pages/sign-in-page';
import { SurveyPage } from '../pages/survey-page';
import { DEMO, DEMO_PASSWORD, expect, test, uniqueEmail, waitForMail } from '../fixtures';

test.setTimeout(120_000);

test('a survey with photos becomes an estimate the client accepts and pays a deposit on; the job joins the board', async ({ browser, request }) => {
  const t = Math.random().toString(36).slice(2, 7);
  const owner = await apiAs(DEMO.owner);
  const clientEmail = uniqueEmail('harriet');
  const client = await owner.post<{ id: string }>('/api/clients', { name: `Harriet Pembleton ${t}`, email: clientEmail });
  const piano = await owner.post<{ id: string }>('/api/pianos', { clientId: client.id, maker: 'Carrow & Finch', model: 'Salon', type: 'grand', sizeMm: 1778, keytopMaterial: 'ivory' });

  // The technician assesses the piano on a tablet.
  const tablet = await browser.newContext({ viewport: { width: 1024, height: 768 } });
  const techPage = await tablet.newPage();
  await new SignInPage(techPage).goto();
  await new SignInPage(techPage).signInAs(DEMO.technician, DEMO_PASSWORD);
  const survey = new SurveyPage(techPage);
  await survey.start(piano.id, 'The client’s home');
  const surveyId = techPage.url().split('/').pop()!;
  await survey.grade('Hammers', 'Replace');
  await survey.addPhotos('Hammers', 2);
  await survey.grade('Case and finish', 'Needs work');
  await survey.summarise('Sound instrument; worn action and tired case.', `New hammers and case work ${t}`, 'Case', ['Revive the shellac', 'Strip and refinish']);
  await tablet.close();

  // The owner prepares the estimate from the survey and sends it.
  const office = await browser.newContext({ viewport: { width: 1920, height: 1080 } });
  const page = await office.newPage();
  await new SignInPage(page).goto();
  await new SignInPage(page).signInAs(DEMO.owner, DEMO_PASSWORD);
  await page.goto(`/surveys/${surveyId}/estimate`);
  await page.getByRole('checkbox', { name: 'Case tidy' }).check();
  await page.getByLabel('Option for Case tidy').selectOption({ label: 'Case: Revive the shellac' });
  await page.getByLabel('Option for Full refinish in black polyester').selectOption({ label: 'Case: Strip and refinish' });
  await page.getByRole('button', { name: 'Create the draft estimate' }).click();
  await page.getByRole('button', { name: 'Issue and send to the client' }).click();

  // The client opens the mailed link in a browser of their own, chooses, accepts and pays.
  const mail = await waitForMail(request, clientEmail);
  const link = /https?:\/\/[^\s]+\/c\/[A-Za-z0-9_-]+/.exec(mail.text)?.[0];
  expect(link, 'a client link in the e-mail').toBeTruthy();
  const home = await browser.newContext({ viewport: { width: 390, height: 844 } });
  const clientPage = await home.newPage();
  await clientPage.goto(new URL(link!).pathname);
  await clientPage.getByRole('group', { name: /Case: choose one/ }).getByRole('radio', { name: /Strip and refinish/ }).check();
  await clientPage.getByLabel('Your full name').fill(`Harriet Pembleton ${t}`);
  await clientPage.getByRole('button', { name: 'Accept this estimate' }).click();
  await clientPage.getByRole('button', { name: /^Pay the deposit of £[\d,.]+ by card$/ }).click();
  await expect(clientPage.getByRole('heading', { name: 'Test card payment' })).toBeVisible();
  await clientPage.getByRole('button', { name: /^Pay / }).click();
  await expect(clientPage.getByText(/Deposit of £[\d,.]+ received/)).toBeVisible({ timeout: 15_000 });
  await home.close();

  // The job is on the board, in the first stage, with its tasks and budget.
  const board = await owner.get<{ stages: Array<{ name: string; jobs: Array<{ id: string; title: string }> }> }>('/api/board');
  const first = board.stages[0]!;
  const job = first.jobs.find((j) => j.title.includes(`New hammers and case work ${t}`));
  expect(job, `the accepted job in ${first.name}`).toBeTruthy();
  const tasks = await owner.get<{ tasks: Array<{ title: string; estimatedMinutes: number | null }> }>(`/api/jobs/${job!.id}/tasks`);
  expect(tasks.tasks.length).toBeGreaterThan(0);
  expect(tasks.tasks.every((x) => (x.estimatedMinutes ?? 0) > 0)).toBe(true);
  const costing = await owner.get<{ money: { priceMinor: number; receivedMinor: number } }>(`/api/jobs/${job!.id}/costing`);
  expect(costing.money.priceMinor).toBeGreaterThan(0);
  expect(costing.money.receivedMinor).toBeGreaterThan(0);

  await page.goto('/board');
  await expect(page.getByRole('region', { name: first.name, exact: true }).getByRole('article', { name: job!.title })).toBeVisible();
  await office.close();
  await owner.dispose();
});
