// What a new user would try, role by role, against the seeded demo (server/db/demo-scenario.ts).
import { TIMEOUT, signIn } from './helpers.mjs';

async function expectScreen(page, testId, { shows = [], hides = [] }) {
  const screen = page.getByTestId(testId);
  await screen.waitFor({ state: 'visible', timeout: TIMEOUT });
  for (const text of shows) {
    await screen.getByText(text, { exact: false }).first().waitFor({ state: 'visible', timeout: TIMEOUT });
  }
  const content = await screen.innerText();
  for (const text of hides) {
    if (content.includes(text)) throw new Error(`${testId} shows "${text}", which it must not`);
  }
}

async function newPage(page) {
  const context = await page.context().browser().newContext({ viewport: page.viewportSize() });
  return context.newPage();
}

export const scenarios = [
  {
    name: 'a clinician sees their own caseload',
    run: async ({ page, baseUrl }) => {
      await signIn(page, baseUrl, 'maren.oakley@linden-clinic.example');
      await expectScreen(page, 'screen-caseload', {
        shows: ['Ilse Varga', 'Caio Brandt', 'Noor Haddad', 'Clarinet'],
        hides: ['Felix Amsel'],
      });
    },
  },
  {
    name: 'a musician sees their home with instrument and clinician',
    run: async ({ page, baseUrl }) => {
      await signIn(page, baseUrl, 'ilse.varga@harbourside.example');
      await expectScreen(page, 'screen-musician-home', { shows: ['Ilse Varga', 'Violin', 'Dr Maren Oakley'] });
    },
  },
  {
    name: 'a teacher sees only the students who shared with them',
    run: async ({ page, baseUrl }) => {
      await signIn(page, baseUrl, 'agnes.whitlow@harbourside.example');
      await expectScreen(page, 'screen-students', {
        shows: ['Ilse Varga', 'Noor Haddad', 'Felix Amsel'],
        hides: ['Caio Brandt'],
      });
    },
  },
  {
    name: 'an admin sees every account',
    run: async ({ page, baseUrl }) => {
      await signIn(page, baseUrl, 'admin@ritorno.example');
      await expectScreen(page, 'screen-admin-users', { shows: ['Tomas Reyne', 'Dario Lenz', 'Noor Haddad'] });
      await page.getByTestId('nav-audit').click();
      await expectScreen(page, 'screen-audit', {});
    },
  },
  {
    name: 'an invited musician joins through the e-mailed link and appears in that caseload only',
    run: async ({ page, baseUrl, size }) => {
      const email = `lena.moro.${size}@harbourside.example`;
      await signIn(page, baseUrl, 'maren.oakley@linden-clinic.example');
      await expectScreen(page, 'screen-caseload', { shows: ['Ilse Varga'] });
      await page.getByTestId('invite-role-musician').click();
      await page.getByTestId('invite-name').fill(`Lena Moro ${size}`);
      await page.getByTestId('invite-email').fill(email);
      await page.getByTestId('invite-instrument').fill('Oboe');
      await page.getByTestId('invite-submit').click();
      await expectScreen(page, 'screen-caseload', { shows: [`Lena Moro ${size}`] });

      const admin = await newPage(page);
      await signIn(admin, baseUrl, 'admin@ritorno.example');
      // The e-mail goes through SMTP after the invitation is saved: look again until it is there.
      const row = admin.getByTestId('mail-row').filter({ hasText: email }).first();
      for (let attempt = 0; attempt < 10; attempt += 1) {
        await admin.goto(`${baseUrl}/mailbox`, { waitUntil: 'networkidle' });
        if (await row.isVisible()) break;
        await admin.waitForTimeout(500);
      }
      await row.click();
      const body = await admin.getByTestId('mail-body').innerText({ timeout: TIMEOUT });
      const link = body.match(/https?:\/\/\S+\/invitation\/\S+/)?.[0];
      if (!link) throw new Error(`no invitation link in the e-mail:\n${body}`);

      const invited = await newPage(page);
      await invited.goto(link, { waitUntil: 'networkidle' });
      await invited.getByTestId('accept-password').fill('a-long-enough-password');
      await invited.getByTestId('accept-submit').click();
      await expectScreen(invited, 'screen-musician-home', { shows: [`Lena Moro ${size}`, 'Oboe'] });

      await page.reload({ waitUntil: 'networkidle' });
      await expectScreen(page, 'screen-caseload', { shows: [`Lena Moro ${size}`] });
      const other = await newPage(page);
      await signIn(other, baseUrl, 'tomas.reyne@linden-clinic.example');
      await expectScreen(other, 'screen-caseload', { shows: ['Felix Amsel'], hides: [`Lena Moro ${size}`] });
    },
  },
];
