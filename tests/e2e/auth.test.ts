import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { passwordHash } from '../../server/lib/password.js';
import { User } from '../../server/models/index.js';
import { DEMO, demoStudioSeed } from '../../server/seed/demo-studio.js';
import { testAppCreate, type TestApp } from '../helpers/test-app.js';
import { axeSeriousFindings } from './axe-check.js';
import { browserLaunch, screenshot, serverStart, type RunningServer } from './harness.js';

const WAIT = { timeout: 15_000 };

describe('accounts in chromium', () => {
  let server: RunningServer;
  let browser: Browser;
  let db: TestApp;
  const run = randomUUID().slice(0, 8);
  const owner = {
    studioName: `Fernhill Knit Studio ${run}`,
    name: 'Maren Holt',
    email: `maren.${run}@fernhill.example`,
    password: 'heather marl and a long seam',
  };

  beforeAll(async () => {
    // The demo cutter must exist in the test database; seeding twice changes nothing.
    db = testAppCreate();
    await demoStudioSeed(db.sequelize);
    server = await serverStart();
    browser = await browserLaunch();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
    await db?.close();
  });

  async function pageOpen({ forAxe = false } = {}): Promise<Page> {
    // axe-core is injected as a script, which the app's CSP rightly forbids: only the axe check bypasses it.
    const context = await browser.newContext({ viewport: { width: 1280, height: 860 }, bypassCSP: forAxe });
    return context.newPage();
  }

  async function signIn(page: Page, email: string, password: string): Promise<void> {
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password', { exact: true }).fill(password);
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  }

  it('signs up a new studio, signs out, and signs in again onto the page asked for', async () => {
    const page = await pageOpen();
    await page.goto(`${server.url}/sign-up`);
    await page.getByRole('heading', { name: 'Create a studio account' }).waitFor(WAIT);

    // The shared schema's messages appear beside the fields before anything is sent.
    await page.getByRole('button', { name: 'Create the studio' }).click();
    const studioName = page.getByLabel('Studio name');
    await page.getByText('Studio name is required').waitFor(WAIT);
    expect(await studioName.getAttribute('aria-invalid')).toBe('true');
    expect(await studioName.getAttribute('aria-describedby')).toMatch(/error/);
    await screenshot(page, 'auth-sign-up-errors');

    await studioName.fill(owner.studioName);
    await page.getByLabel('Your name').fill(owner.name);
    await page.getByLabel('E-mail').fill(owner.email);
    await page.getByLabel('Password', { exact: true }).fill(owner.password);
    await page.getByRole('button', { name: 'Create the studio' }).click();

    await page.getByRole('heading', { name: `Welcome, ${owner.name}` }).waitFor(WAIT);
    expect(await page.getByTestId('header-studio').textContent()).toBe(owner.studioName);
    expect(await page.getByTestId('header-member').textContent()).toContain('Owner');
    expect(await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Studio' }).count()).toBe(1);
    await screenshot(page, 'auth-home-owner');

    // The same e-mail cannot make a second studio: the server's field error sits beside E-mail.
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(/\/sign-in$/, WAIT);
    await page.goto(`${server.url}/sign-up`);
    await page.getByLabel('Studio name').fill('Second Studio');
    await page.getByLabel('Your name').fill(owner.name);
    await page.getByLabel('E-mail').fill(owner.email);
    await page.getByLabel('Password', { exact: true }).fill(owner.password);
    await page.getByRole('button', { name: 'Create the studio' }).click();
    await page.getByText('An account with this e-mail already exists').first().waitFor(WAIT);
    expect(await page.getByLabel('E-mail').getAttribute('aria-invalid')).toBe('true');

    // A signed-out visit to a signed-in page goes to sign-in with the way back.
    await page.goto(`${server.url}/account`);
    await page.waitForURL(/\/sign-in\?next=%2Faccount$/, WAIT);
    await page.getByRole('heading', { name: 'Sign in' }).waitFor(WAIT);
    await screenshot(page, 'auth-sign-in');

    await signIn(page, owner.email, 'not the password at all');
    await page.getByText('The e-mail or the password is not right.').waitFor(WAIT);
    expect(new URL(page.url()).pathname).toBe('/sign-in');

    await signIn(page, owner.email, owner.password);
    await page.getByRole('heading', { name: 'Your account' }).waitFor(WAIT);
    expect(new URL(page.url()).pathname).toBe('/account');
    await screenshot(page, 'auth-account');

    // A new name shows in the header at once.
    owner.name = 'Maren Holt-Ward';
    await page.getByLabel('Name', { exact: true }).fill(owner.name);
    await page.getByRole('button', { name: 'Save name' }).click();
    await page.getByText('Name saved.').waitFor(WAIT);
    await page.getByTestId('header-member').getByText(owner.name).waitFor(WAIT);

    // A wrong current password is the server's field error, beside that field.
    await page.getByLabel('Current password').fill('not my password at all');
    await page.getByLabel('New password').fill('a different long phrase of wool');
    await page.getByRole('button', { name: 'Change password' }).click();
    await page.getByText('Current password is not right').waitFor(WAIT);
    expect(await page.getByLabel('Current password').getAttribute('aria-invalid')).toBe('true');

    // Signing out from any page lands on a plain sign-in page, and the session is gone.
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(`${server.url}/sign-in`, WAIT);
    await page.goto(`${server.url}/`);
    await page.getByRole('heading', { name: 'Sign in' }).waitFor(WAIT);
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await page.context().close();
  }, 120_000);

  it('ignores a return address on another site', async () => {
    const page = await pageOpen();
    await page.goto(`${server.url}/sign-in?next=${encodeURIComponent('//evil.example/account')}`);
    await page.getByRole('heading', { name: 'Sign in' }).waitFor(WAIT);
    await signIn(page, owner.email, owner.password);
    await page.getByRole('heading', { name: `Welcome, ${owner.name}` }).waitFor(WAIT);
    expect(page.url()).toBe(`${server.url}/`);
    await page.context().close();
  });

  it('shows the owner the studio screen and refuses to demote the last owner with the server message', async () => {
    const page = await pageOpen();
    await page.goto(`${server.url}/sign-in?next=%2Fstudio`);
    await signIn(page, owner.email, owner.password);
    await page.getByRole('heading', { name: 'Defaults' }).waitFor(WAIT);
    await page.getByTestId(`member-${owner.email}`).waitFor(WAIT);
    // Stored in mm, shown in the studio's unit: 6.35 mm is 1/4 in (1 in = 25.4 mm, NIST SP 811).
    expect(await page.getByLabel('Seam allowance').inputValue()).toBe('1/4');
    await screenshot(page, 'auth-studio-owner');

    await page.getByRole('button', { name: `Make cutter: ${owner.name}` }).click();
    const dialog = page.getByRole('dialog', { name: 'Make yourself a cutter?' });
    await dialog.waitFor(WAIT);
    await dialog.getByRole('button', { name: 'Make cutter' }).click();
    await dialog.getByText('The studio needs at least one active owner').waitFor(WAIT);
    await screenshot(page, 'auth-studio-last-owner');
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    await dialog.waitFor({ state: 'hidden', ...WAIT });
    expect(await page.getByTestId('header-member').textContent()).toContain('Owner');
    await page.context().close();
  });

  it('lets the owner change the defaults in the studio unit and manage a member, each change confirmed', async () => {
    // A second member of the new studio, made directly: inviting people is not part of this screen yet.
    const me = await User.findOne({ where: { email: owner.email } });
    if (!me) throw new Error('the owner signed up in the first test is missing');
    const cutter = { name: 'Ines Marsh', email: `ines.${run}@fernhill.example` };
    await User.create({ studioId: me.studioId, ...cutter, role: 'cutter', passwordHash: await passwordHash(`${run} long cutter phrase`) });

    const page = await pageOpen();
    await page.goto(`${server.url}/sign-in?next=%2Fstudio`);
    await signIn(page, owner.email, owner.password);
    await page.getByRole('heading', { name: 'Defaults' }).waitFor(WAIT);

    // Switching to centimetres re-writes the typed allowances: 1/4 in = 6.35 mm shows as 0.6 cm
    // (to 1 mm), 1/2 in = 12.7 mm as 1.3 cm (1 in = 25.4 mm, NIST SP 811).
    await page.getByLabel('Unit').selectOption('cm');
    expect(await page.getByLabel('Seam allowance').inputValue()).toBe('0.6');
    expect(await page.getByLabel('Hem allowance').inputValue()).toBe('1.3');
    await page.getByLabel('Hem allowance').fill('9');
    await page.getByRole('button', { name: 'Save defaults' }).click();
    await page.getByText('Hem allowance must be between 0 cm and 5.1 cm').waitFor(WAIT);
    await page.getByLabel('Hem allowance').fill('2');
    await page.getByLabel('Binding ratio').fill('0.85');
    await page.getByRole('button', { name: 'Save defaults' }).click();
    await page.getByText('Studio defaults saved.').waitFor(WAIT);

    const row = page.getByTestId(`member-${cutter.email}`);
    await row.waitFor(WAIT);
    const confirm = async (button: string, dialogName: string | RegExp, confirmLabel: string) => {
      await page.getByRole('button', { name: `${button}: ${cutter.name}` }).click();
      const dialog = page.getByRole('dialog', { name: dialogName });
      await dialog.waitFor(WAIT);
      await dialog.getByRole('button', { name: confirmLabel, exact: true }).click();
      await dialog.waitFor({ state: 'hidden', ...WAIT });
    };
    await confirm('Disable', `Disable ${cutter.name}'s account?`, 'Disable account');
    await row.getByText('Disabled', { exact: true }).waitFor(WAIT);
    await page.getByText(`${cutter.name}'s account is disabled.`).waitFor(WAIT);
    await confirm('Enable', `Enable ${cutter.name}'s account?`, 'Enable account');
    await row.getByText('Active', { exact: true }).waitFor(WAIT);
    await confirm('Make owner', `Make ${cutter.name} an owner?`, 'Make owner');
    await row.getByText('Owner', { exact: true }).waitFor(WAIT);
    await screenshot(page, 'auth-studio-two-owners');
    await confirm('Remove', `Remove ${cutter.name} from the studio?`, `Remove ${cutter.name}`);
    await row.waitFor({ state: 'detached', ...WAIT });
    expect(await User.count({ where: { email: cutter.email } })).toBe(0);

    // The overview shows the saved defaults in the new unit.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Overview' }).click();
    await page.getByRole('heading', { name: `Welcome, ${owner.name}` }).waitFor(WAIT);
    await page.getByText('2 cm', { exact: true }).waitFor(WAIT);
    expect(await page.getByText('0.85', { exact: true }).count()).toBe(1);
    await page.context().close();
  }, 120_000);

  it('shows the demo cutter no owner controls', async () => {
    const page = await pageOpen();
    await page.goto(`${server.url}/sign-in`);
    await signIn(page, DEMO.cutter.email, DEMO.cutter.password);
    await page.getByRole('heading', { name: `Welcome, ${DEMO.cutter.name}` }).waitFor(WAIT);
    expect(await page.getByTestId('header-member').textContent()).toContain('Cutter');
    const nav = page.getByRole('navigation', { name: 'Main' });
    await nav.getByRole('link', { name: 'Overview' }).waitFor(WAIT);
    expect(await nav.getByRole('link', { name: 'Studio' }).count()).toBe(0);
    expect(await page.getByRole('link', { name: /studio defaults|members/i }).count()).toBe(0);
    await screenshot(page, 'auth-home-cutter');

    await page.goto(`${server.url}/studio`);
    await page.getByRole('heading', { name: /for the studio.s owners/ }).waitFor(WAIT);
    expect(await page.getByText('Owners only').count()).toBe(1);
    expect(await page.getByRole('button', { name: /Make (owner|cutter)|Disable|Remove/ }).count()).toBe(0);
    expect(await page.getByLabel('Seam allowance').count()).toBe(0);
    await screenshot(page, 'auth-studio-cutter');
    await page.context().close();
  });

  // WCAG 2.2 AA via axe-core's rules; findings of impact "serious" or "critical" fail.
  it('passes axe on sign-in and on the overview', async () => {
    const page = await pageOpen({ forAxe: true });
    await page.goto(`${server.url}/sign-in`);
    await page.getByRole('heading', { name: 'Sign in' }).waitFor(WAIT);
    expect(await axeSeriousFindings(page)).toEqual([]);
    // With the error states showing too.
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.getByText('Password is required').waitFor(WAIT);
    expect(await axeSeriousFindings(page)).toEqual([]);

    // Keyboard only: the e-mail field, Tab to the password, Enter sends the form.
    await page.getByLabel('E-mail').fill('');
    await page.getByLabel('E-mail').focus();
    await page.keyboard.type(owner.email);
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => document.activeElement?.getAttribute('autocomplete'))).toBe('current-password');
    await page.keyboard.type(owner.password);
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { name: `Welcome, ${owner.name}` }).waitFor(WAIT);
    await page.getByTestId('server-status').getByText('running').waitFor(WAIT);
    expect(await axeSeriousFindings(page)).toEqual([]);

    // The owner's other screens, and a confirmation dialog open over the studio screen.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Studio' }).click();
    await page.getByTestId(`member-${owner.email}`).waitFor(WAIT);
    expect(await axeSeriousFindings(page)).toEqual([]);
    await page.getByRole('button', { name: `Make cutter: ${owner.name}` }).click();
    await page.getByRole('dialog').waitFor(WAIT);
    expect(await axeSeriousFindings(page)).toEqual([]);
    await page.keyboard.press('Escape');
    await page.getByRole('dialog').waitFor({ state: 'hidden', ...WAIT });
    await page.goto(`${server.url}/account`);
    await page.getByRole('heading', { name: 'Your account' }).waitFor(WAIT);
    expect(await axeSeriousFindings(page)).toEqual([]);
    await page.context().close();
  }, 120_000);
});
