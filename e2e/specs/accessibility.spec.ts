import AxeBuilder from '@axe-core/playwright';
import { SignInPage } from '../pages/sign-in-page';
import { TeamPage } from '../pages/team-page';
import { DEMO, DEMO_PASSWORD, expect, test } from '../fixtures';

async function seriousViolations(page: import('@playwright/test').Page) {
  const results = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
  return results.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => `${v.id}: ${v.help}`);
}

test('the sign-in page has no serious or critical accessibility violations', async ({ page }) => {
  await new SignInPage(page).goto();
  expect(await seriousViolations(page)).toEqual([]);
});

test('the Team page has no serious or critical accessibility violations', async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.goto();
  await signIn.signInAs(DEMO.owner, DEMO_PASSWORD);
  const team = new TeamPage(page);
  await team.goto();
  await expect(page.getByRole('button', { name: 'Send invitation' })).toBeVisible();
  expect(await seriousViolations(page)).toEqual([]);
});
