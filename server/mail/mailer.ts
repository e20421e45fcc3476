import nodemailer, { type Transporter } from 'nodemailer';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
  replyTo?: string;
}

export const FROM_ADDRESS = 'Dilato <no-reply@dilato.test>';

/** Sends through SMTP: the embedded fake by default, a real server when SMTP_URL is set. */
export class Mailer {
  private readonly transport: Transporter;

  constructor(smtpUrl: string) {
    this.transport = nodemailer.createTransport(smtpUrl);
  }

  async send(mail: OutgoingMail): Promise<string> {
    const info = await this.transport.sendMail({ from: FROM_ADDRESS, ...mail });
    return info.messageId;
  }

  close() {
    this.transport.close();
  }
}
