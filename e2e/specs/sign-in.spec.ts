import { AppShell } from '../pages/app-shell';
import { SignInPage } from '../pages/sign-in-page';
import { DEMO, DEMO_PASSWORD, expect, test } from '../fixtures';

test.describe('signing in', () => {
  test('the demo owner signs in and sees the workshop and the Team page in the navigation', async ({ page }) => {
    const signIn = new SignInPage(page);
    await signIn.goto();
    await signIn.signInAs(DEMO.owner, DEMO_PASSWORD);
    const shell = new AppShell(page);
    await shell.expectWorkshop('Fennick Cross Piano Works');
    await expect(shell.nav().getByRole('link', { name: 'Team' })).toBeVisible();
  });

  test('a wrong password gets one plain message and stays on the sign-in page', async ({ page }) => {
    const signIn = new SignInPage(page);
    await signIn.goto();
    await signIn.signIn(DEMO.owner, 'not-the-password');
    await expect(page.getByRole('alert')).toContainText('e-mail and password do not match');
    await expect(page).toHaveURL(/\/sign-in/);
  });

  test('an empty form shows errors beside the fields without calling the server', async ({ page }) => {
    const signIn = new SignInPage(page);
    await signIn.goto();
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByLabel('E-mail')).toHaveAttribute('aria-invalid', 'true');
  });

  test('a page asked for before signing in opens after signing in', async ({ page }) => {
    await page.goto('/team');
    await expect(page).toHaveURL(/\/sign-in\?next=/);
    await new SignInPage(page).signIn(DEMO.owner, DEMO_PASSWORD);
    await expect(page.getByRole('heading', { name: 'Team', level: 1 })).toBeVisible();
  });
});
