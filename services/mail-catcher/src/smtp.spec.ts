import type { AddressInfo } from 'node:net';
import nodemailer from 'nodemailer';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MailStore } from './mail-store.js';
import { createSmtpServer } from './smtp.js';

const store = new MailStore(3);
const smtp = createSmtpServer(store);
let port = 0;
beforeAll(
  () =>
    new Promise<void>((resolve) =>
      smtp.listen(0, '127.0.0.1', () => {
        port = (smtp.server.address() as AddressInfo).port;
        resolve();
      }),
    ),
);
afterAll(() => new Promise<void>((resolve) => smtp.close(() => resolve())));

describe('mail catcher', () => {
  it('keeps a message sent over real SMTP with its parts', async () => {
    const transport = nodemailer.createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true });
    await transport.sendMail({ from: 'Alder Bend <shop@demo.tubwright.test>', to: 'buyer@example.test', subject: 'Quote Q-1', text: 'Total 1 234.00', html: '<p>Total 1 234.00</p>' });
    const [message] = store.list();
    expect(message).toMatchObject({ to: ['buyer@example.test'], subject: 'Quote Q-1', html: '<p>Total 1 234.00</p>' });
    expect(message!.text.trim()).toBe('Total 1 234.00');
    expect(message!.from).toContain('shop@demo.tubwright.test');
  });

  it('keeps only the newest messages up to its cap', () => {
    for (let i = 0; i < 5; i++) store.add({ from: 'a', to: ['b'], subject: `m${i}`, text: '', html: null, receivedAt: new Date().toISOString() });
    expect(store.list().map((m) => m.subject)).toEqual(['m4', 'm3', 'm2']);
  });
});
