import nodemailer from 'nodemailer';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
}

/** Sends e-mail; the one seam between the app and SMTP (real or the local fake). */
export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
}

export function createSmtpMailer(smtpUrl: string, from: string): Mailer {
  const transport = nodemailer.createTransport(smtpUrl);
  return {
    async send(mail) {
      await transport.sendMail({ from, to: mail.to, subject: mail.subject, text: mail.text });
    },
  };
}

/** Fire-and-log: an e-mail failure must never undo the database change that caused it. */
export function sendInBackground(mailer: Mailer, mail: OutgoingMail): void {
  mailer.send(mail).catch((error: unknown) => {
    console.error(`[mail] could not send "${mail.subject}" to ${mail.to}:`, error);
  });
}
