import nodemailer, { type Transporter } from 'nodemailer';

export interface OutgoingMail {
  to: string | string[];
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; content: Buffer | string; contentType?: string }[];
}

/** Real SMTP (to the local mail catcher in development); every send is also written to mail_log by the caller. */
export class Mailer {
  private readonly transport: Transporter;

  constructor(
    smtp: { host: string; port: number },
    readonly from: string,
  ) {
    this.transport = nodemailer.createTransport({ host: smtp.host, port: smtp.port, secure: false, ignoreTLS: true });
  }

  async send(mail: OutgoingMail): Promise<{ messageId: string }> {
    const info = await this.transport.sendMail({ from: this.from, ...mail });
    return { messageId: info.messageId };
  }
}
