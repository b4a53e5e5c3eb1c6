import { describe, expect, test } from 'vitest';
import { journey, snapshot } from '../support/browser.ts';

describe('journey: a moderator signs in and out', () => {
  const j = journey();

  test('when demo-moderator signs in through the stand-in page, then the review desk shows in the navigation, sign-out removes it, and signing in again at once works', async () => {
    const { page } = j.browser;

    await page.goto(j.live.baseUrl);
    await expect(page.getByRole('heading', { level: 1 }).textContent()).resolves.toContain('Measure it once');
    const nav = page.getByRole('navigation', { name: 'Main' });
    expect(await nav.getByRole('link', { name: 'Review desk' }).count()).toBe(0);
    await snapshot(page, 'home-visitor');

    await page.getByRole('link', { name: 'Sign in', exact: true }).first().click();
    await page.getByRole('heading', { name: /Sign in \(local stand-in\)/ }).waitFor();
    await snapshot(page, 'stand-in-picker', { fullPage: false });
    await page.getByRole('button', { name: /demo-moderator/ }).click();

    await page.waitForURL(`${j.live.baseUrl}/`);
    await snapshot(page, 'after-sign-in');
    await page.getByTestId('signed-in-login').waitFor();
    expect(await page.getByTestId('signed-in-login').textContent()).toBe('demo-moderator');
    expect(await page.getByTestId('signed-in-role').textContent()).toBe('Moderator');
    await nav.getByRole('link', { name: 'Review desk' }).waitFor();
    expect(await nav.getByRole('link', { name: 'Admin' }).count()).toBe(0);
    await snapshot(page, 'home-moderator');

    // The logout's answer is the new signed-out session: the page reads nothing more, so signing in again at once
    // cannot race a session read that would set its own cookie over the sign-in's.
    // A read of the user's own builds is still on its way when they sign out (held back 1 s here): sign-out waits for
    // its answer before it ends the session, so it comes back 200, not 401.
    await page.route(/\/api\/builds\/mine$/, async (route) => {
      await new Promise((r) => setTimeout(r, 1000));
      await route.continue();
    });
    await page.reload();
    await page.getByText('Loading your builds…').waitFor();
    const order: string[] = [];
    page.on('response', (r) => void (r.url().endsWith('/api/builds/mine') && order.push(`mine ${r.status()}`)));
    page.on('request', (r) => void (r.url().endsWith('/auth/logout') && order.push('logout')));
    const logout = page.waitForResponse((r) => r.url() === `${j.live.baseUrl}/auth/logout`);
    const sessionReads: string[] = [];
    page.on('request', (r) => void (r.url() === `${j.live.baseUrl}/api/session` && sessionReads.push(r.url())));
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('link', { name: 'Sign in', exact: true }).first().waitFor();
    expect(await nav.getByRole('link', { name: 'Review desk' }).count()).toBe(0);
    expect(await (await logout).json()).toEqual({ user: null, csrfToken: expect.any(String) });
    expect(order).toEqual(['mine 200', 'logout']);
    await page.unroute(/\/api\/builds\/mine$/);
    await page.getByRole('link', { name: 'Sign in', exact: true }).first().click();
    await page.getByRole('button', { name: /demo-maker/ }).click();
    await page.getByTestId('signed-in-login').filter({ hasText: 'demo-maker' }).waitFor();
    expect(sessionReads).toHaveLength(1); // the new page's own first read, none left over from signing out
    expect(j.errors).toEqual([]);
  });

  test('when a phone-width visitor opens the menu, then the navigation is reachable', async () => {
    const { page } = j.browser;
    await page.setViewportSize({ width: 390, height: 800 });
    await page.goto(`${j.live.baseUrl}/no/such/page`);
    await page.getByRole('heading', { name: 'No page at this address' }).waitFor();
    await page.getByRole('button', { name: 'Menu' }).click();
    await page.locator('#mobile-nav').getByRole('link', { name: 'Workbench' }).waitFor();
    await snapshot(page, 'phone-menu-404');
    await page.setViewportSize({ width: 1280, height: 860 });
  });
});
