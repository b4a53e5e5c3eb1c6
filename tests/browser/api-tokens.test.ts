import { beforeAll, describe, expect, test } from 'vitest';
import { journey, snapshot } from '../support/browser.ts';
import { createUser } from '../support/factories.ts';

describe('journey: a maker makes a rig token, copies it once and revokes it', () => {
  const j = journey();
  beforeAll(() => j.browser.context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: j.live.baseUrl }));

  test('when the maker creates a token, then its secret shows once, works from a script, and stops working once revoked', async () => {
    const { page } = j.browser;
    const { live } = j;
    const user = await createUser();
    const name = 'Bench PC, capacitive rig';
    await page.goto(`${live.baseUrl}/auth/github?login=${user.login}`);
    await page.getByTestId('signed-in-login').waitFor();
    await page.goto(`${live.baseUrl}/account`);
    const section = page.getByRole('region', { name: 'Rig tokens' });
    await section.getByText('No tokens yet.').waitFor();

    await section.getByRole('button', { name: 'Create token' }).click();
    await section.getByText('Give the token a name').waitFor();
    await section.getByLabel('Token name').fill(name);
    await section.getByRole('checkbox', { name: /Read what I can see/ }).check();
    await section.getByRole('button', { name: 'Create token' }).click();

    const secretBox = section.getByTestId('new-token-secret');
    await secretBox.waitFor();
    const secret = (await secretBox.textContent())!.trim();
    expect(secret).toMatch(/^swt_[A-Za-z0-9_-]{43}$/);
    await section.getByText('it will not be shown again').waitFor();
    await section.getByRole('button', { name: 'Copy' }).click();
    await section.getByText('Copied to the clipboard.').waitFor();
    expect(await page.evaluate(() => navigator.clipboard.readText())).toBe(secret);
    await section.getByRole('listitem').filter({ hasText: name }).getByText('never used').waitFor();
    await snapshot(section, 'account-rig-token-created-1280');

    const asRig = () => fetch(`${live.baseUrl}/api/account/settings`, { headers: { Authorization: `Bearer ${secret}` } });
    expect((await asRig()).status).toBe(200);

    await section.getByRole('button', { name: 'I have stored it' }).click();
    await page.reload();
    await section
      .getByRole('listitem')
      .filter({ hasText: name })
      .getByText(/last used/)
      .waitFor();
    expect(await page.content()).not.toContain(secret.slice(4));
    await page.setViewportSize({ width: 390, height: 800 });
    expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
    await snapshot(section, 'account-rig-tokens-390');
    await page.setViewportSize({ width: 1280, height: 860 });

    await section.getByRole('button', { name: `Revoke ${name}` }).click();
    await section.getByRole('button', { name: 'Revoke token' }).click();
    await section.getByText('No tokens yet.').waitFor();
    expect((await asRig()).status).toBe(401);
    expect(j.errors).toEqual([]);
  });
});
