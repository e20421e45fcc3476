import type { Browser } from 'playwright-core';
import { DESKTOP, launchBrowser, newPage, pageErrors, PHONE, screenshot, signIn } from './browser';

const ROLES = [
  { role: 'admin', label: 'Admin' },
  { role: 'engineer', label: 'Engineer' },
  { role: 'fabricator', label: 'Fabricator' },
  { role: 'sales', label: 'Sales' },
] as const;

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser.close());

describe.each([
  ['phone', PHONE],
  ['desktop', DESKTOP],
])('signing in at %s width', (size, viewport) => {
  it('when a signed-out person opens the app, then the sign-in screen shows in Source Sans 3', async () => {
    const { context, page } = await newPage(browser, viewport);
    await page.goto('/');
    await page.waitForURL('**/sign-in');
    const button = page.getByRole('button', { name: 'Sign in', exact: true });
    await button.waitFor();
    await page.evaluate(() => document.fonts.ready);
    for (const text of [page.getByRole('heading', { name: 'Your shop account' }), button.getByText('Sign in', { exact: true })]) {
      expect(await text.evaluate((el) => getComputedStyle(el).fontFamily)).toMatch(/SourceSans3/);
    }
    const loaded = await page.evaluate(() =>
      [...document.fonts].filter((f) => f.family.includes('SourceSans3') && f.status === 'loaded').length,
    );
    expect(loaded).toBeGreaterThan(0);
    await screenshot(page, `sign-in-${size}`);
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  });

  for (const { role, label } of ROLES) {
    it(`when the demo ${role} signs in, then the ${label} home shows, and sign-out returns to sign-in`, async () => {
      const { context, page } = await newPage(browser, viewport);
      await signIn(page, `${role}@dilato.test`);
      await page.getByRole('heading', { name: `${label} home` }).waitFor();
      await screenshot(page, `home-${role}-${size}`);

      // On a phone the screens that do not fit the tab bar sit behind "More".
      const more = page.getByRole('button', { name: 'More' });
      if (await more.count()) await more.click();
      const users = page.getByRole('link', { name: 'Users' });
      if (role === 'admin') await users.first().waitFor();
      else expect(await users.count()).toBe(0);

      await page.getByRole('button', { name: 'Sign out' }).first().click();
      await page.waitForURL('**/sign-in');
      await page.goto('/');
      await page.waitForURL('**/sign-in');
      expect(pageErrors(page)).toEqual([]);
      await context.close();
    });
  }
});

it('when the password is wrong, then the sign-in screen says so and stays', async () => {
  const { context, page } = await newPage(browser, PHONE);
  await signIn(page, 'fabricator@dilato.test', 'not-the-password');
  const alert = page.getByRole('alert');
  await alert.waitFor();
  expect(await alert.textContent()).toMatch(/e-mail or password is not right/i);
  expect(page.url()).toMatch(/\/sign-in$/);
  await screenshot(page, 'sign-in-wrong-password');
  await context.close();
});

it('when the address is empty or malformed, then the field says what is wrong before anything is sent', async () => {
  const { context, page } = await newPage(browser, PHONE);
  await signIn(page, 'not-an-address', '');
  await page.getByText('Enter a valid e-mail address').waitFor();
  await page.getByText('Enter your password').waitFor();
  await context.close();
});

it('when an unknown page is opened while signed in, then a not-found page with a way home shows', async () => {
  const { context, page } = await newPage(browser, DESKTOP);
  await signIn(page, 'engineer@dilato.test');
  await page.getByRole('heading', { name: 'Engineer home' }).waitFor();
  await page.goto('/no/such/page');
  await page.getByRole('link', { name: /home/i }).first().waitFor();
  await screenshot(page, 'not-found');
  await context.close();
});
