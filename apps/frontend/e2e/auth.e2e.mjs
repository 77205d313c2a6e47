import assert from 'node:assert/strict';
import { describe, test } from 'node:test';
import { browserForFile, navLabels, screenshot, signIn, url } from './browser.mjs';

// Sign-in is throttled per address: this file signs in five times in all.
const accounts = [
  { role: 'clerk', email: 'clerk@demo.example', label: 'Receiving clerk' },
  { role: 'qa_lead', email: 'qa@demo.example', label: 'QA lead' },
  { role: 'purchasing', email: 'buyer@demo.example', label: 'Purchasing' },
  { role: 'admin', email: 'admin@demo.example', label: 'Administrator' },
];

// Who may use each screen (DESIGN.md). A role's navigation may show only screens listed
// for it here; screens not built yet are simply absent. Clerks read Instruments.
const ALL = ['clerk', 'qa_lead', 'purchasing', 'admin'];
const screenRoles = {
  Today: ['clerk', 'qa_lead', 'purchasing', 'admin'],
  Receiving: ['clerk', 'qa_lead', 'admin'],
  Lots: ALL,
  Suppliers: ALL,
  Products: ALL,
  Instruments: ['clerk', 'qa_lead', 'admin'],
  Returns: ['purchasing', 'admin'],
  Messages: ['purchasing', 'admin'],
  'Corrective actions': ['purchasing', 'qa_lead', 'admin'],
  Scorecards: ['purchasing', 'qa_lead', 'admin'],
  Reference: ALL,
  Users: ['admin'],
  'Audit trail': ['admin'],
};
const seenByRole = {};

let page;
browserForFile(
  (p) => {
    page = p;
  },
  { pagePerTest: true },
);

const pathOf = (p) => new URL(p.url()).pathname;

async function signOut() {
  await page.locator('header button[aria-haspopup="menu"]').click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await page.waitForURL((u) => u.pathname === '/sign-in');
}

describe('sign-in by role', () => {
  for (const account of accounts) {
    test(`${account.role} signs in, sees only its navigation, keeps a deep link, signs out`, async () => {
      // Start from a deep link while signed out: sign-in must bring the user back to it.
      const deepLink = account.role === 'admin' ? '/users' : '/lots?status=on_hold';
      await page.goto(url(deepLink));
      await page.waitForURL((u) => u.pathname === '/sign-in');
      assert.equal(new URL(page.url()).searchParams.get('redirectTo'), deepLink);
      await signIn(page, account.email);
      await page.waitForURL((u) => `${u.pathname}${u.search}` === deepLink);

      const labels = await navLabels(page);
      seenByRole[account.role] = labels;
      for (const label of labels) {
        assert.ok(screenRoles[label], `unexpected navigation item ${label}`);
        assert.ok(
          screenRoles[label].includes(account.role),
          `${account.role} must not see ${label}`,
        );
      }
      assert.equal(labels.includes('Users'), account.role === 'admin');
      if (account.role === 'admin') {
        for (const [role, theirs] of Object.entries(seenByRole)) {
          for (const label of theirs)
            assert.ok(labels.includes(label), `admin lacks ${role}'s ${label}`);
        }
      }

      await page.reload();
      await page.getByRole('heading', { level: 1 }).first().waitFor();
      const here = new URL(page.url());
      assert.equal(`${here.pathname}${here.search}`, deepLink, 'a reload keeps the deep link');

      // Home screen for every role, purchasing included: Today, its queue of work.
      await page.goto(url('/'));
      await page.waitForURL((u) => u.pathname === '/today');
      await page.getByRole('heading', { level: 1 }).first().waitFor();
      await page.getByText(`You are signed in as ${account.label}.`, { exact: false }).waitFor();
      await page.getByText('Safety caution').waitFor();
      await page.waitForLoadState('networkidle');
      await screenshot(page, `home-${account.role}`);

      if (account.role === 'admin') {
        await page.goto(url('/users'));
        await page.getByRole('cell', { name: 'clerk@demo.example' }).waitFor();
        await screenshot(page, 'users-admin');
        await page.goto(url('/no-such-screen'));
        await page.getByRole('heading', { name: 'Page not found' }).waitFor();
        await screenshot(page, 'not-found');
      } else {
        await page.goto(url('/users'));
        await page.getByText("This screen is not part of your role's work.").waitFor();
      }

      await signOut();
      await page.goto(url('/today'));
      await page.waitForURL((u) => u.pathname === '/sign-in');
    });
  }
});

test('a wrong password shows one generic message and stays on sign-in', async () => {
  await page.goto(url('/sign-in'));
  await signIn(page, 'clerk@demo.example', 'not-the-password');
  const alert = page.getByRole('alert');
  await alert.waitFor();
  const message = (await alert.textContent()) ?? '';
  assert.ok(message.trim().length > 0);
  assert.doesNotMatch(
    message,
    /unknown (user|e-?mail)|no such user|password is (wrong|incorrect)/i,
  );
  assert.equal(pathOf(page), '/sign-in');
  await screenshot(page, 'sign-in-wrong-password');
});

test('signed out, an unknown path asks to sign in first', async () => {
  await page.goto(url('/no-such-screen'));
  await page.waitForURL((u) => u.pathname === '/sign-in');
  await page.getByText('Sign in to continue where you were.').waitFor();
  await screenshot(page, 'sign-in');
});
