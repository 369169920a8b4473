import { mkdtemp, readdir, rm, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import nodemailer from 'nodemailer';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readAllCapturedMail, startSmtpFake, waitForMail, type SmtpFake } from './smtp-fake.js';

let dir: string;
let fake: SmtpFake;

beforeAll(async () => {
  dir = await mkdtemp(path.join(os.tmpdir(), 'dm-smtp-fake-'));
  fake = await startSmtpFake({ port: 0, captureDir: dir, maxMessageBytes: 64 * 1024 });
});
afterAll(async () => {
  await fake.close();
  await rm(dir, { recursive: true, force: true });
});

function transport() {
  return nodemailer.createTransport({ host: '127.0.0.1', port: fake.port, secure: false });
}

describe('startSmtpFake', () => {
  it('listens on a real port when asked for port 0', () => {
    expect(fake.port).toBeGreaterThan(0);
    expect(fake.host).toBe('127.0.0.1');
  });

  it('captures each message as parsed JSON, newest first', async () => {
    const mailer = transport();
    await mailer.sendMail({
      from: 'Driftmark <no-reply@driftmark.test>',
      to: 'Ana <ana@example.test>',
      subject: 'First',
      text: 'Plain part',
      html: '<p>HTML part</p>',
      messageId: '<first@driftmark.local>',
    });
    await mailer.sendMail({
      from: 'no-reply@driftmark.test',
      to: 'ben@example.test',
      subject: 'Second',
      text: 'Only text',
    });
    mailer.close();

    const [second, first] = await readAllCapturedMail(dir);
    expect(first).toMatchObject({
      from: 'Driftmark <no-reply@driftmark.test>',
      to: ['ana@example.test'],
      subject: 'First',
      html: '<p>HTML part</p>',
      messageId: '<first@driftmark.local>',
    });
    expect(first!.text.trim()).toBe('Plain part');
    expect(first!.id).toMatch(/^\d{13}-[0-9a-f]+$/);
    expect(Date.parse(first!.receivedAt)).not.toBeNaN();
    expect(second).toMatchObject({ subject: 'Second', to: ['ben@example.test'], html: null });
    expect(Number(second!.id.split('-')[0])).toBeGreaterThan(Number(first!.id.split('-')[0]));
    expect((await readdir(dir)).every((name) => name.endsWith('.json'))).toBe(true);
  });

  it('refuses a message above the size limit and captures nothing', async () => {
    const before = (await readAllCapturedMail(dir)).length;
    const mailer = transport();
    await expect(
      mailer.sendMail({
        from: 'a@example.test',
        to: 'b@example.test',
        subject: 'Big',
        text: 'x'.repeat(100 * 1024),
      }),
    ).rejects.toThrow(/552|size|exceed/i);
    mailer.close();
    expect(await readAllCapturedMail(dir)).toHaveLength(before);
  });
});

describe('readAllCapturedMail and waitForMail', () => {
  it('treats a missing folder as empty and skips half-written files', async () => {
    expect(await readAllCapturedMail(path.join(dir, 'missing'))).toEqual([]);
    await writeFile(path.join(dir, '9999999999999-abc.json.tmp'), '{');
    const mails = await readAllCapturedMail(dir);
    expect(mails.every((m) => !m.id.includes('tmp'))).toBe(true);
  });

  it('waits for a match and names what it saw on timeout', async () => {
    const mailer = transport();
    const pending = waitForMail(dir, (m) => m.subject === 'Later', 5_000);
    setTimeout(
      () =>
        void mailer.sendMail({ from: 'a@example.test', to: 'c@example.test', subject: 'Later', text: 'hi' }),
      100,
    );
    expect((await pending).to).toEqual(['c@example.test']);
    mailer.close();
    await expect(waitForMail(dir, (m) => m.subject === 'Never', 200)).rejects.toThrow(/within 200 ms.*Later/);
  });
});
