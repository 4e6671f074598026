import nodemailer, { type Transporter } from 'nodemailer';

/** What the app needs from e-mail: send one message. Tests may pass a fake. */
export interface Mailer {
  send(msg: { to: string; subject: string; text: string; html?: string }): Promise<void>;
  close(): void;
}

/** nodemailer over SMTP; the URL points at the local fake in development, demo and tests. */
export function createMailer(smtpUrl: string, from: string, opts: { ignoreTLS?: boolean } = {}): Mailer {
  const transport: Transporter = nodemailer.createTransport(smtpUrl, { ignoreTLS: opts.ignoreTLS ?? false } as object);
  return {
    async send(msg) {
      await transport.sendMail({ from, ...msg });
    },
    close() {
      transport.close();
    },
  };
}

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** A plain message with one call to action; text and HTML carry the same words. */
export function linkMessage(opts: { greeting: string; lines: string[]; linkLabel: string; url: string; footer: string }) {
  const text = [opts.greeting, '', ...opts.lines, '', `${opts.linkLabel}: ${opts.url}`, '', opts.footer].join('\n');
  const html = `<p>${escapeHtml(opts.greeting)}</p>${opts.lines.map((l) => `<p>${escapeHtml(l)}</p>`).join('')}<p><a href="${escapeHtml(opts.url)}">${escapeHtml(opts.linkLabel)}</a></p><p style="color:#666">${escapeHtml(opts.footer)}</p>`;
  return { text, html };
}
