// A musician of their own for a scenario that changes its musician for good (a red flag stops all
// playing until review): invited by a clinician, joined through the e-mailed link and given an active
// plan, all through the API as the app would send it. Names and addresses are invented.
import { PASSWORD } from './helpers.mjs';

function londonDate(offsetDays = 0) {
  const date = new Date(Date.now() + offsetDays * 86_400_000);
  return new Intl.DateTimeFormat('en-CA', { timeZone: 'Europe/London', year: 'numeric', month: '2-digit', day: '2-digit' }).format(date);
}

async function expectStatus(response, status, what) {
  if (response.status() !== status) throw new Error(`${what}: ${response.status()} ${await response.text()}`);
  return response.json().catch(() => null);
}

async function signedIn(browser, baseUrl, email) {
  const context = await browser.newContext();
  const response = await context.request.post(`${baseUrl}/api/auth/sign-in/email`, { headers: { Origin: baseUrl }, data: { email, password: PASSWORD } });
  if (!response.ok()) throw new Error(`${email} could not sign in: ${response.status()}`);
  return context;
}

/**
 * Invites `name` to `clinician`'s caseload, accepts the invitation with the demo password and activates
 * a plan that starts today with no rest day, one short session (1 min warm-up, two 5 min blocks).
 */
export async function musicianWithPlan(browser, baseUrl, { clinician, name, email, instrument }) {
  const headers = { Origin: baseUrl };
  const clinic = await signedIn(browser, baseUrl, clinician);
  const admin = await signedIn(browser, baseUrl, 'admin@ritorno.example');
  const guest = await browser.newContext();
  try {
    const invited = await expectStatus(
      await clinic.request.post(`${baseUrl}/api/invitations`, { headers, data: { role: 'musician', name, email, instrument } }),
      201,
      `inviting ${email}`,
    );
    let token = null;
    for (let attempt = 0; attempt < 20 && !token; attempt += 1) {
      const mail = await expectStatus(await admin.request.get(`${baseUrl}/api/admin/mail`), 200, 'reading the mailbox');
      const message = mail.find((m) => m.to.includes(email));
      token = message?.text.match(/\/invitation\/([^\s/?#]+)/)?.[1] ?? null;
      if (!token) await new Promise((resolve) => setTimeout(resolve, 250));
    }
    if (!token) throw new Error(`no invitation e-mail to ${email}`);
    await expectStatus(await guest.request.post(`${baseUrl}/api/invitations/by-token/${token}/accept`, { headers, data: { password: PASSWORD } }), 201, 'accepting the invitation');

    const plans = `${baseUrl}/api/musicians/${encodeURIComponent(invited.musicianId)}/plans`;
    const settings = {
      startDate: londonDate(),
      timeZone: 'Europe/London',
      event: { name: 'Quayside audition', date: londonDate(60) },
      startMinutesPerDay: 10,
      startBlockMinutes: 5,
      targetMinutesPerDay: 60,
      warmUpMinutes: 1,
      coolDownMinutes: 1,
      restDaysPerWeek: 0,
    };
    const draft = await expectStatus(await clinic.request.post(plans, { headers, data: { settings } }), 201, 'creating the plan');
    await expectStatus(await clinic.request.post(`${plans}/${draft.id}/activate`, { headers }), 200, 'activating the plan');
    return invited.musicianId;
  } finally {
    await Promise.all([clinic.close(), admin.close(), guest.close()]);
  }
}
