// The teacher's side, tried as a new user would: a student's cleared pieces, and the view shrinking
// (with a change e-mail) after that student's failed gate. Seeded data: server/db/demo-scenario.ts.
import { PASSWORD, TIMEOUT, signIn } from './helpers.mjs';

async function visible(locator) {
  await locator.first().waitFor({ state: 'visible', timeout: TIMEOUT });
}

async function openStudent(page, baseUrl, name) {
  await page.goto(`${baseUrl}/students`, { waitUntil: 'networkidle' });
  await page.locator('[data-testid^="student-open-"]').filter({ hasText: name }).first().click();
  await visible(page.getByTestId('screen-student-clearance').getByText(name));
}

async function expectNoMedicalWords(page) {
  const text = await page.getByTestId('screen-student-clearance').innerText();
  for (const word of ['pain', 'Pain', 'check-in', 'diagnos', 'stepped back']) {
    if (text.includes(word)) throw new Error(`the teacher's clearance screen mentions "${word}"`);
  }
}

function todayInLondon() {
  return new Intl.DateTimeFormat('en-CA', { timeZone: 'Europe/London', year: 'numeric', month: '2-digit', day: '2-digit' }).format(new Date());
}

export const teacherScenarios = [
  {
    name: 'a teacher opens a student and sees the pieces cleared now and those projected',
    run: async ({ page, baseUrl }) => {
      await signIn(page, baseUrl, 'agnes.whitlow@harbourside.example');
      await visible(page.getByTestId('screen-students').getByText('On track'));
      await openStudent(page, baseUrl, 'Ilse Varga');
      const cleared = page.getByTestId('pieces-cleared');
      await visible(cleared.getByText('Sarabande in D minor'));
      await visible(cleared.getByText('Rondo for the Quay'));
      await visible(cleared.getByText('Cleared now'));
      const notYet = page.getByTestId('pieces-not-yet');
      await visible(notYet.getByText('Caprice No. 3'));
      await visible(notYet.getByText(/Not yet · projected/));
      await visible(page.getByTestId('programme-readiness').getByText('2 of 3 programme pieces cleared'));
      await expectNoMedicalWords(page);

      const [note] = await Promise.all([page.waitForEvent('popup', { timeout: TIMEOUT }), page.getByTestId('clearance-print').click()]);
      await note.waitForLoadState();
      const printed = await note.locator('body').innerText();
      if (!printed.includes('Sarabande in D minor')) throw new Error(`the printable note lacks the cleared piece:\n${printed}`);
      await note.close();
    },
  },
  {
    name: 'after a student’s failed gate the teacher’s view shrinks and a change e-mail arrives',
    sizes: ['phone'],
    run: async ({ page, baseUrl }) => {
      await signIn(page, baseUrl, 'dario.lenz@harbourside.example');
      await openStudent(page, baseUrl, 'Noor Haddad');
      await visible(page.getByTestId('pieces-cleared').getByText('Nocturne in E flat'));

      // The musician's report goes through the API, as her app would send it.
      const musician = await page.context().browser().newContext();
      const headers = { Origin: baseUrl };
      const signedIn = await musician.request.post(`${baseUrl}/api/auth/sign-in/email`, {
        headers,
        data: { email: 'noor.haddad@harbourside.example', password: PASSWORD },
      });
      if (!signedIn.ok()) throw new Error(`the musician could not sign in: ${signedIn.status()}`);
      const report = await musician.request.post(`${baseUrl}/api/check-ins`, {
        headers,
        data: { clientKey: `e2e-report-${Date.now()}`, checkIn: { kind: 'pain_report', date: todayInLondon(), pain: 4, redFlags: [] } },
      });
      if (report.status() !== 201) throw new Error(`the check-in was refused: ${report.status()} ${await report.text()}`);
      await musician.close();

      await page.reload({ waitUntil: 'networkidle' });
      await visible(page.getByTestId('pieces-cleared-empty'));
      await visible(page.getByTestId('pieces-not-yet').getByText('Nocturne in E flat'));
      await visible(page.getByTestId('student-header').getByText('Delayed'));
      await expectNoMedicalWords(page);

      const admin = await (await page.context().browser().newContext({ viewport: page.viewportSize() })).newPage();
      await signIn(admin, baseUrl, 'admin@ritorno.example');
      const row = admin.getByTestId('mail-row').filter({ hasText: 'Playing clearance changed: Noor Haddad' }).filter({ hasText: 'dario.lenz' });
      // The fake mail server parses a message a moment after accepting it: look again before giving up.
      for (let attempt = 1; ; attempt += 1) {
        await admin.goto(`${baseUrl}/mailbox`, { waitUntil: 'networkidle' });
        const found = await row.first().waitFor({ state: 'visible', timeout: 3_000 }).then(() => true, () => false);
        if (found) break;
        if (attempt === 5) throw new Error('no "Playing clearance changed" e-mail to dario.lenz in the development mailbox');
      }
      await row.first().click();
      const body = await admin.getByTestId('mail-body').innerText({ timeout: TIMEOUT });
      if (!body.includes('nothing for the moment')) throw new Error(`the change e-mail does not show the smaller clearance:\n${body}`);
      if (/pain/i.test(body)) throw new Error(`the change e-mail mentions pain:\n${body}`);
    },
  },
];
