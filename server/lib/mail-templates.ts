import type { StudentClearance } from '../../shared/schemas/clearance';
import type { OutgoingMail } from './mailer';

/** Plain-text e-mails; every one says who sent it and why, and carries no clinical detail. */
export function invitationMail(input: {
  to: string;
  name: string;
  role: 'musician' | 'teacher';
  invitedBy: string;
  link: string;
  expiresAt: Date;
}): OutgoingMail {
  const purpose =
    input.role === 'musician'
      ? 'to follow the graded return-to-playing plan your clinician prepares for you'
      : "to see which repertoire your students are cleared to play and for how long";
  return {
    to: input.to,
    subject: `${input.invitedBy} invited you to Ritorno`,
    text: [
      `Hello ${input.name},`,
      '',
      `${input.invitedBy} invited you to Ritorno ${purpose}.`,
      'Open this link to set your password and sign in:',
      input.link,
      '',
      `The link works once and expires on ${input.expiresAt.toUTCString()}.`,
      'If you did not expect this e-mail, you can ignore it.',
    ].join('\n'),
  };
}

export function passwordResetMail(input: { to: string; name: string; link: string }): OutgoingMail {
  return {
    to: input.to,
    subject: 'Reset your Ritorno password',
    text: [
      `Hello ${input.name},`,
      '',
      'Someone asked to reset the password of your Ritorno account. Open this link to choose a new one:',
      input.link,
      '',
      'The link expires in one hour. If you did not ask for this, ignore this e-mail: your password stays as it is.',
    ].join('\n'),
  };
}

/** To the clinician only: it names symptoms, so it never goes to a teacher. */
export function checkInAlertMail(input: {
  to: string;
  clinicianName: string;
  musicianName: string;
  urgent: boolean;
  what: string;
  date: string;
  change: string | null;
  link: string;
}): OutgoingMail {
  const subject = input.urgent
    ? `Red flag: ${input.musicianName} has stopped playing`
    : `Pain gate: ${input.musicianName} went over the threshold`;
  return {
    to: input.to,
    subject,
    text: [
      `Hello ${input.clinicianName},`,
      '',
      `${input.musicianName} checked in on ${input.date}: ${input.what}.`,
      input.change ? `Plan: ${input.change}` : 'The plan is unchanged.',
      input.urgent
        ? 'All playing is stopped until you review and clear it. Red-flag symptoms need prompt clinical review.'
        : 'The session ended at that gate, as the plan says.',
      '',
      `Open the record: ${input.link}`,
    ].join('\n'),
  };
}

/** To a teacher: limits and repertoire only. Never a reason, a symptom or a score. */
export function clearanceChangeMail(input: { to: string; teacherName: string; view: StudentClearance; link: string }): OutgoingMail {
  const { view } = input;
  const cleared = view.pieces.filter((piece) => piece.cleared);
  const lines = cleared.length
    ? cleared.map((piece) => `- ${piece.title}${piece.composer ? ` (${piece.composer})` : ''}${piece.passages.length && !piece.passages.every((p) => p.cleared) ? ', without its demanding passages for now' : ''}`)
    : ['- nothing for the moment'];
  return {
    to: input.to,
    subject: `Playing clearance changed: ${view.name}`,
    text: [
      `Hello ${input.teacherName},`,
      '',
      `What ${view.name} (${view.instrument}) may play has changed as of ${view.asOf}.`,
      view.readiness === 'paused'
        ? 'Playing is paused for now: please do not ask for any playing until you hear again.'
        : `Longest continuous playing: ${view.limits.longestBlockMinutes} min, then a ${view.limits.restMinutes}-min break. Most playing in a day: ${view.limits.minutesPerDay} min.`,
      '',
      'Cleared now:',
      ...lines,
      '',
      `See the details and a printable note: ${input.link}`,
    ].join('\n'),
  };
}

export function sharedWithYouMail(input: { to: string; musicianName: string; link: string }): OutgoingMail {
  return {
    to: input.to,
    subject: `${input.musicianName} shared their playing clearance with you`,
    text: [
      'Hello,',
      '',
      `${input.musicianName} chose to show you, through Ritorno, which repertoire they are cleared to play and how long they may play in a lesson or rehearsal.`,
      `See it here: ${input.link}`,
      '',
      'They can stop sharing at any time.',
    ].join('\n'),
  };
}
