// The page the server draws: a musician's Today shows their day before the app's script has arrived, and
// the app takes it over without a loading screen in between, scrolled where the page was left.
import { TIMEOUT, signIn } from './helpers.mjs';

export const firstPaintScenarios = [
  {
    name: "a musician's Today is on screen before the app has started, and the app takes it over where it was scrolled",
    sizes: ['phone'],
    run: async ({ page, baseUrl }) => {
      await signIn(page, baseUrl, 'ilse.varga@harbourside.example');
      // Hold the app's script back: until it is released, what shows is the page as the server drew it.
      let release = () => undefined;
      const held = new Promise((resolve) => (release = resolve));
      await page.route('**/_expo/static/js/web/index-*.js', async (route) => {
        await held;
        await route.continue();
      });
      await page.addInitScript(() => {
        window.sawOpening = false;
        new MutationObserver(() => {
          if (document.body?.textContent?.includes('Opening Ritorno')) window.sawOpening = true;
        }).observe(document, { subtree: true, childList: true, characterData: true });
      });
      await page.goto(`${baseUrl}/home`, { waitUntil: 'commit' });
      await page.getByTestId('morning-check').or(page.getByTestId('today-status')).first().waitFor({ state: 'visible', timeout: TIMEOUT });
      if (await page.locator('#root[data-ready]').count()) throw new Error('the app had started: the script was not held back');
      const preview = await page.evaluate(() => {
        const scroller = [...document.querySelectorAll('#root [data-testid]')].find((element) => element.scrollHeight > element.clientHeight + 200 && getComputedStyle(element).overflowY !== 'visible');
        if (!scroller) return null;
        scroller.scrollTop = 150;
        return { testId: scroller.dataset.testid, top: scroller.scrollTop };
      });
      if (!preview) throw new Error('the drawn page has nothing to scroll at this size');

      release();
      await page.locator('#root[data-ready]').waitFor({ state: 'attached', timeout: TIMEOUT });
      const top = await page.evaluate((testId) => document.querySelector(`[data-testid="${testId}"]`)?.scrollTop, preview.testId);
      if (Math.abs((top ?? -1) - preview.top) > 2) throw new Error(`the app's page is scrolled to ${top}, the drawn page was at ${preview.top}`);
      if (await page.evaluate(() => window.sawOpening)) throw new Error('the loading screen showed between the drawn page and the app');
      // The app runs the page now: its tabs navigate.
      await page.getByRole('link', { name: /My plan/ }).first().click();
      await page.waitForURL((url) => url.pathname === '/plan', { timeout: TIMEOUT });
    },
  },
];
