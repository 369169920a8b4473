/**
 * The mail outbox end to end: queueMail inside a transaction, the pg-boss worker, a real SMTP
 * fake writing captured JSON files, and the dev inbox routes reading them.
 */
import { once } from 'node:events';
import { mkdtemp, rm } from 'node:fs/promises';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { EntityManager } from 'typeorm';
import { startMailWorker, type MailWorker, type MailWorkerTuning } from '../../api/src/jobs/mail.worker.js';
import { createLogger } from '../../api/src/logger.js';
import { renderInvitationMail } from '../../api/src/mail/templates.js';
import { queueMail } from '../../api/src/services/mail.service.js';
import {
  readAllCapturedMail,
  startSmtpFake,
  waitForMail,
  type CapturedMail,
  type SmtpFake,
} from '../../scripts/src/lib/smtp-fake.js';
import { buildTestApp, type TestApp } from './setup/app.js';

/** Fast polling and retries; no cron (each test sweeps explicitly or through start). */
const FAST: Partial<MailWorkerTuning> = {
  pollingIntervalSeconds: 0.5,
  retryDelaySeconds: 1,
  sweepCron: null,
  stopTimeoutMs: 5_000,
};
const logger = createLogger('silent');

let t: TestApp;
let captureDir: string;
let smtp: SmtpFake;
const workers: MailWorker[] = [];
let seq = 0;

beforeAll(async () => {
  captureDir = await mkdtemp(path.join(os.tmpdir(), 'dm-mail-outbox-'));
  smtp = await startSmtpFake({ port: 0, captureDir });
  // Demo mode: the dev inbox routes below exist only there.
  t = await buildTestApp({
    appMode: 'demo',
    smtpUrl: `smtp://127.0.0.1:${smtp.port}`,
    mailCaptureDir: captureDir,
  });
});
afterAll(async () => {
  await t?.close();
  await smtp?.close();
  if (captureDir) await rm(captureDir, { recursive: true, force: true });
});
beforeEach(() => t.reset());
afterEach(async () => {
  await Promise.all(workers.splice(0).map((w) => w.stop()));
});

async function startWorker(tuning: Partial<MailWorkerTuning> = {}): Promise<MailWorker> {
  const worker = await startMailWorker({
    config: t.config,
    dataSource: t.dataSource,
    logger,
    tuning: { ...FAST, ...tuning },
  });
  workers.push(worker);
  return worker;
}

function newAddress(): string {
  seq += 1;
  return `invitee-${seq}-${Date.now()}@example.test`;
}

function invitation(to: string) {
  const link = `http://127.0.0.1:3000/invite/token-${to}`;
  return {
    link,
    mail: {
      kind: 'invitation',
      to,
      ...renderInvitationMail({
        inviteeName: 'Ana <Test>',
        inviterName: 'Mara Lindqvist',
        teamName: 'Northline Physique',
        role: 'athlete',
        link,
        expiresAt: new Date('2030-01-08T10:00:00Z'),
      }),
    },
  };
}

interface OutboxRow {
  id: string;
  status: string;
  attempts: number;
  last_error: string | null;
  sent_at: Date | null;
  message_id: string;
}

async function outboxRows(to: string, manager: EntityManager = t.dataSource.manager): Promise<OutboxRow[]> {
  return manager.query(
    'SELECT id, status, attempts, last_error, sent_at, message_id FROM outbox_messages WHERE to_address = $1',
    [to],
  );
}

async function jobStates(outboxId: string, manager: EntityManager = t.dataSource.manager): Promise<string[]> {
  const rows: { state: string }[] = await manager.query(
    `SELECT state FROM pgboss.job WHERE name = 'mail-send' AND data->>'outboxId' = $1`,
    [outboxId],
  );
  return rows.map((r) => r.state);
}

async function mailsTo(to: string): Promise<CapturedMail[]> {
  return (await readAllCapturedMail(captureDir)).filter((m) => m.to.includes(to));
}

async function eventually<T>(
  probe: () => Promise<T>,
  ok: (value: T) => boolean,
  timeoutMs = 15_000,
): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await probe();
    if (ok(value)) return value;
    if (Date.now() > deadline)
      throw new Error(`condition not met within ${timeoutMs} ms; last value: ${JSON.stringify(value)}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe('queueMail', () => {
  it('leaves no row and no job when the transaction rolls back', async () => {
    await startWorker();
    const to = newAddress();
    let outboxId = '';
    await expect(
      t.dataSource.transaction(async (manager) => {
        const row = await queueMail(manager, invitation(to).mail);
        outboxId = row.id;
        // Inside the transaction both exist: the job went in through the same connection.
        expect(await outboxRows(to, manager)).toHaveLength(1);
        expect(await jobStates(row.id, manager)).toEqual(['created']);
        throw new Error('roll back');
      }),
    ).rejects.toThrow('roll back');

    expect(outboxId).not.toBe('');
    expect(await outboxRows(to)).toHaveLength(0);
    expect(await jobStates(outboxId)).toHaveLength(0);
    await sleep(1_500);
    expect(await mailsTo(to)).toHaveLength(0);
  });

  it('delivers a committed mail exactly once, with a text and an HTML part', async () => {
    const worker = await startWorker();
    const to = newAddress();
    const { mail, link } = invitation(to);
    const row = await t.dataSource.transaction((manager) => queueMail(manager, mail));
    expect(row).toMatchObject({ status: 'pending', attempts: 0, toAddress: to });
    expect(row.messageId).toMatch(/^<[0-9a-f-]{36}@driftmark\.local>$/);

    const captured = await waitForMail(captureDir, (m) => m.to.includes(to), 15_000);
    const [sent] = await eventually(
      () => outboxRows(to),
      (rows) => rows[0]?.status === 'sent',
    );
    expect(sent).toMatchObject({ status: 'sent', attempts: 1, last_error: null });
    expect(sent?.sent_at).toBeInstanceOf(Date);

    expect(captured.subject).toBe('Mara Lindqvist invited you to Northline Physique on Driftmark');
    expect(captured.from).toBe(t.config.mailFrom);
    expect(captured.messageId).toBe(row.messageId);
    expect(captured.text).toContain(link);
    expect(captured.text).toContain('Hello Ana <Test>,');
    expect(captured.html).toContain(`href="${link}"`);
    expect(captured.html).toContain('Hello Ana &lt;Test&gt;,');

    // A sweep and a few more polls change nothing.
    expect(await worker.sweep()).toBe(0);
    await sleep(1_500);
    expect(await mailsTo(to)).toHaveLength(1);
    expect(await jobStates(sent!.id)).toEqual(['completed']);
  });

  it('opens its own transaction when given a manager outside one', async () => {
    const to = newAddress();
    const row = await queueMail(t.dataSource.manager, invitation(to).mail);
    expect((await outboxRows(to))[0]?.id).toBe(row.id);
  });
});

describe('mail worker restarts', () => {
  it('delivers exactly once after a stop before processing: both a queued job and a row without a job', async () => {
    // A slow poller: its first (empty) fetch happens at start, the next one 30 s later.
    const sleepy = await startWorker({ pollingIntervalSeconds: 30 });
    await sleep(500);
    const withJob = newAddress();
    const queued = await t.dataSource.transaction((manager) => queueMail(manager, invitation(withJob).mail));
    expect(await jobStates(queued.id)).toEqual(['created']);
    await sleepy.stop();

    // Written while no queue runs in this process (like a crash between commit and enqueue).
    const orphan = newAddress();
    const orphaned = await t.dataSource.transaction((manager) => queueMail(manager, invitation(orphan).mail));
    expect(await jobStates(orphaned.id)).toEqual([]);
    expect(await mailsTo(withJob)).toHaveLength(0);
    expect(await outboxRows(withJob)).toMatchObject([{ status: 'pending', attempts: 0 }]);

    const worker = await startWorker();
    await waitForMail(captureDir, (m) => m.to.includes(withJob), 15_000);
    await waitForMail(captureDir, (m) => m.to.includes(orphan), 15_000);
    await eventually(
      async () => [...(await outboxRows(withJob)), ...(await outboxRows(orphan))],
      (rows) => rows.length === 2 && rows.every((r) => r.status === 'sent'),
    );

    // The sweep gave the orphan one job and left the queued one alone. The queue completes a job
    // after its handler has marked the row sent, so wait for that state rather than read it once.
    const done = (states: string[]) => states.length === 1 && states[0] === 'completed';
    expect(await eventually(() => jobStates(queued.id), done)).toEqual(['completed']);
    expect(await eventually(() => jobStates(orphaned.id), done)).toEqual(['completed']);
    expect(await worker.sweep()).toBe(0);
    await sleep(1_500);
    expect(await mailsTo(withJob)).toHaveLength(1);
    expect(await mailsTo(orphan)).toHaveLength(1);
    expect(await outboxRows(withJob)).toMatchObject([{ status: 'sent', attempts: 1 }]);
    expect(await outboxRows(orphan)).toMatchObject([{ status: 'sent', attempts: 1 }]);
  });
});

describe('a send cut off by a kill', () => {
  /** What a worker killed mid-send leaves: the row claimed (attempt counted), its lease `lease` from now. */
  async function claimedBy(outboxId: string, lease: string): Promise<void> {
    await t.dataSource.query(
      `UPDATE outbox_messages SET status = 'sending', attempts = attempts + 1,
              sending_until = now() + $2::interval WHERE id = $1`,
      [outboxId, lease],
    );
  }

  it('is not sent again while the claiming worker’s lease runs', async () => {
    // A slow poller (next fetch in 30 s) lets the mail get its job without being sent.
    const sleepy = await startWorker({ pollingIntervalSeconds: 30 });
    await sleep(500);
    const to = newAddress();
    const row = await t.dataSource.transaction((manager) => queueMail(manager, invitation(to).mail));
    expect(await jobStates(row.id)).toEqual(['created']);
    await claimedBy(row.id, '1 hour');
    await sleepy.stop();
    const worker = await startWorker();
    // Its job ran and found the row claimed; the sweep finds nothing to enqueue.
    await eventually(
      () => jobStates(row.id),
      (states) => states.length === 1 && states[0] === 'completed',
    );
    expect(await worker.sweep()).toBe(0);
    expect(await mailsTo(to)).toHaveLength(0);
    expect(await outboxRows(to)).toMatchObject([{ status: 'sending', attempts: 1 }]);
  });

  it('goes out once more after the lease, the cut-off attempt counted, with the SMTP answer recorded', async () => {
    const to = newAddress();
    const row = await t.dataSource.transaction((manager) => queueMail(manager, invitation(to).mail));
    await claimedBy(row.id, '-1 second');
    await startWorker();
    await waitForMail(captureDir, (m) => m.to.includes(to), 15_000);
    const [sent] = await eventually(
      () => outboxRows(to),
      (rows) => rows[0]?.status === 'sent',
    );
    expect(sent).toMatchObject({ status: 'sent', attempts: 2, last_error: null });
    const answers = (await t.dataSource.query('SELECT smtp_response FROM outbox_messages WHERE id = $1', [
      row.id,
    ])) as { smtp_response: string }[];
    expect(answers[0]?.smtp_response).toMatch(/^250\b/);
    expect(await mailsTo(to)).toHaveLength(1);
  });
});

describe('SMTP failures', () => {
  it('records a failed attempt, retries with backoff and delivers once the server is back', async () => {
    const port = smtp.port;
    const to = newAddress();
    await smtp.close();
    try {
      await startWorker();
      await t.dataSource.transaction((manager) => queueMail(manager, invitation(to).mail));
      // Each attempt is claimed (attempts + 1, status sending) before the SMTP server is tried, so
      // wait for the failure to be recorded, not just for the claim.
      const [failed] = await eventually(
        () => outboxRows(to),
        (rows) =>
          (rows[0]?.attempts ?? 0) >= 1 && rows[0]?.status === 'pending' && rows[0]?.last_error != null,
      );
      expect(failed).toMatchObject({ status: 'pending' });
      expect(failed?.last_error).toMatch(/ECONNREFUSED|connect/i);
      expect(await mailsTo(to)).toHaveLength(0);
    } finally {
      smtp = await startSmtpFake({ port, captureDir });
    }
    await waitForMail(captureDir, (m) => m.to.includes(to), 20_000);
    const [sent] = await eventually(
      () => outboxRows(to),
      (rows) => rows[0]?.status === 'sent',
    );
    expect(sent!.attempts).toBeGreaterThanOrEqual(2);
    expect(sent!.last_error).toBeNull();
    await sleep(1_000);
    expect(await mailsTo(to)).toHaveLength(1);
  }, 40_000);

  it('marks the message failed after the last attempt', async () => {
    const port = smtp.port;
    await smtp.close();
    try {
      await startWorker({ retryLimit: 1 });
      const to = newAddress();
      const row = await t.dataSource.transaction((manager) => queueMail(manager, invitation(to).mail));
      const [failed] = await eventually(
        () => outboxRows(to),
        (rows) => rows[0]?.status === 'failed',
        20_000,
      );
      expect(failed).toMatchObject({ status: 'failed', attempts: 2 });
      expect(failed?.last_error).toBeTruthy();
      await eventually(
        () => jobStates(row.id),
        (states) => states.length === 1 && states[0] === 'failed',
      );
    } finally {
      smtp = await startSmtpFake({ port, captureDir });
    }
  }, 40_000);
});

describe('dev inbox routes', () => {
  it('lists captured mail newest first, reads one, and refuses ids that are not captured mail', async () => {
    await startWorker();
    const first = newAddress();
    const second = newAddress();
    await t.dataSource.transaction((manager) => queueMail(manager, invitation(first).mail));
    await waitForMail(captureDir, (m) => m.to.includes(first));
    await t.dataSource.transaction((manager) => queueMail(manager, invitation(second).mail));
    await waitForMail(captureDir, (m) => m.to.includes(second));

    const list = await request(t.app).get('/api/dev/mail');
    expect(list.status).toBe(200);
    const rows = list.body.data as { id: string; receivedAt: string; to: string[]; subject: string }[];
    const ours = rows.filter((r) => r.to.includes(first) || r.to.includes(second));
    expect(ours.map((r) => r.to[0])).toEqual([second, first]);
    expect(Object.keys(ours[0]!).sort()).toEqual(['id', 'receivedAt', 'subject', 'to']);

    const one = await request(t.app).get(`/api/dev/mail/${ours[0]!.id}`);
    expect(one.status).toBe(200);
    expect(one.body.data).toMatchObject({ id: ours[0]!.id, to: [second], from: t.config.mailFrom });
    expect(one.body.data.text).toContain(`/invite/token-${second}`);
    expect(one.body.data.html).toContain(`/invite/token-${second}`);

    for (const bad of [
      '..%2F..%2Fetc%2Fpasswd',
      '..',
      '%2e%2e',
      'abc.json',
      '1700000000000-deadbeef',
      'a%00b',
    ]) {
      const res = await request(t.app).get(`/api/dev/mail/${bad}`);
      expect(res.status, bad).toBe(404);
      expect(res.body.error?.code, bad).toBe('not_found');
    }
  });

  it('does not exist outside demo mode', async () => {
    for (const appMode of ['production', 'test', 'development'] as const) {
      const other = await buildTestApp({ appMode, mailCaptureDir: captureDir });
      try {
        for (const path of ['/api/dev/mail', '/api/dev/mail/1700000000000-abc']) {
          const res = await request(other.app).get(path);
          expect(res.status, `${appMode} ${path}`).toBe(404);
          expect(res.body.error.code).toBe('not_found');
        }
      } finally {
        await other.close();
      }
    }
  });

  // A real connection from another address of this machine (not 127/8 or ::1), when it has one.
  const outside = Object.values(os.networkInterfaces())
    .flat()
    .find((i) => i && i.family === 'IPv4' && !i.internal)?.address;
  it.skipIf(!outside)('answers 404 to a client that is not on loopback, even in demo mode', async () => {
    const server = t.app.listen(0, '0.0.0.0');
    await once(server, 'listening');
    try {
      const { port } = server.address() as AddressInfo;
      const remote = await fetch(`http://${outside}:${port}/api/dev/mail`);
      expect(remote.status).toBe(404);
      expect(((await remote.json()) as { error: { code: string } }).error.code).toBe('not_found');
      const local = await fetch(`http://127.0.0.1:${port}/api/dev/mail`);
      expect(local.status).toBe(200);
    } finally {
      server.closeAllConnections();
      server.close();
    }
  });
});
