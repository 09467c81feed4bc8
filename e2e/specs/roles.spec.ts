import { AppShell } from '../pages/app-shell';
import { SignInPage } from '../pages/sign-in-page';
import { DEMO, DEMO_PASSWORD, expect, test } from '../fixtures';

test('a technician sees no owner-only navigation and a plain message at an owner-only address', async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.goto();
  await signIn.signInAs(DEMO.technician, DEMO_PASSWORD);
  const shell = new AppShell(page);
  await shell.expectWorkshop('Fennick Cross Piano Works');
  await expect(shell.nav().getByRole('link', { name: 'Team' })).toHaveCount(0);

  await page.goto('/team');
  await expect(page.getByText('Only the workshop owner can manage the team')).toBeVisible();
  await expect(page.getByRole('button', { name: 'Send invitation' })).toHaveCount(0);
});

test('an address that does not exist shows the not-found page', async ({ page }) => {
  await page.goto('/no-such-page');
  await expect(page.getByText('There is no page at this address')).toBeVisible();
});
