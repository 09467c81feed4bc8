import { AcceptInvitationPage } from '../pages/accept-invitation-page';
import { AppShell } from '../pages/app-shell';
import { SignInPage } from '../pages/sign-in-page';
import { TeamPage } from '../pages/team-page';
import { DEMO, DEMO_PASSWORD, expect, linkIn, test, uniqueEmail, waitForMail } from '../fixtures';

test('the owner invites a technician, who joins from the e-mailed link and signs in', async ({ page, browser, request }) => {
  const email = uniqueEmail('declan-apprentice');
  const signIn = new SignInPage(page);
  await signIn.goto();
  await signIn.signInAs(DEMO.owner, DEMO_PASSWORD);
  const team = new TeamPage(page);
  await team.goto();
  await team.invite(email, 'technician');

  const mail = await waitForMail(request, email);
  expect(mail.subject).toContain('Fennick Cross Piano Works');

  const invitee = await browser.newContext();
  const invitePage = await invitee.newPage();
  await invitePage.goto(linkIn(mail, 'invitations'));
  await expect(invitePage.getByText('Fennick Cross Piano Works').first()).toBeVisible();
  await new AcceptInvitationPage(invitePage).accept('Rowan Tillery', 'apprentice pass 1');
  const shell = new AppShell(invitePage);
  await shell.expectWorkshop('Fennick Cross Piano Works');
  await shell.signOut();

  const again = new SignInPage(invitePage);
  await again.signInAs(email, 'apprentice pass 1');
  await shell.expectWorkshop('Fennick Cross Piano Works');
  await expect(shell.nav().getByRole('link', { name: 'Team' })).toHaveCount(0);

  await invitePage.goto(linkIn(mail, 'invitations'));
  await expect(invitePage.getByText(/expired or has already been used/i)).toBeVisible();
  await invitee.close();

  await page.reload();
  await expect(page.getByRole('table').or(page.getByRole('list')).filter({ hasText: email }).first()).toBeVisible();
});
