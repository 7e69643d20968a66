// What every browser scenario needs: the demo password, one patience for the page, and signing in.
export const PASSWORD = 'ritorno-demo-2026';
export const TIMEOUT = 15_000;

/** Signs in through the form and waits until the app has left the sign-in screen. */
export async function signIn(page, baseUrl, email, password = PASSWORD) {
  await page.goto(`${baseUrl}/sign-in`, { waitUntil: 'networkidle' });
  await page.getByTestId('sign-in-email').fill(email);
  await page.getByTestId('sign-in-password').fill(password);
  await page.getByTestId('sign-in-submit').click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'), { timeout: TIMEOUT });
}
