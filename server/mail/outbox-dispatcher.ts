import { and, asc, eq, lte, sql } from 'drizzle-orm';
import type { Transporter } from 'nodemailer';
import type { Database } from '../db/client';
import { outboxMessages } from '../db/schema';

/** Messages sent per transaction; each batch holds its rows locked only while it sends them. */
const BATCH_SIZE = 10;
/** First retry after 2 s, doubling each time … */
const FIRST_RETRY_DELAY_MS = 2_000;
/** … up to 5 minutes between attempts. */
const MAX_RETRY_DELAY_MS = 5 * 60_000;
/** After this many failed attempts a message is marked failed and no longer retried. */
export const MAX_DELIVERY_ATTEMPTS = 20;
const MAX_ERROR_LENGTH = 2_000;

export interface OutboxDispatcherOptions {
  db: Database;
  transport: Transporter;
  /** Sender, e.g. 'QuietLayer <no-reply@larkspur.example>' (MAIL_FROM). */
  from: string;
  intervalMs?: number;
  /** Told about each failed attempt (e.g. a pino logger's warn). */
  onError?: (error: unknown, messageId: string) => void;
}

export interface OutboxDispatcher {
  /** Stops polling and waits for a send in progress to finish. */
  stop(): Promise<void>;
  /** Sends every message due now; resolves to how many were sent. */
  drain(): Promise<number>;
}

/** Delay before the next attempt after `attempts` failures: 2 s · 2^(attempts−1), capped at 5 min. */
export function retryDelayMs(attempts: number): number {
  return Math.min(MAX_RETRY_DELAY_MS, FIRST_RETRY_DELAY_MS * 2 ** Math.max(0, attempts - 1));
}

/**
 * Sends pending outbox messages through nodemailer, polling every `intervalMs`.
 * Due rows are claimed with FOR UPDATE SKIP LOCKED, so several server processes can run a
 * dispatcher each and every message still goes out once. A failed send keeps the message
 * pending with its error and schedules a retry with exponential back-off; after
 * MAX_DELIVERY_ATTEMPTS it is marked failed.
 */
export function startOutboxDispatcher(options: OutboxDispatcherOptions): OutboxDispatcher {
  const { db, transport, from, intervalMs = 1_000, onError } = options;

  async function sendBatch(): Promise<{ claimed: number; sent: number }> {
    return db.transaction(async (tx) => {
      const due = await tx
        .select()
        .from(outboxMessages)
        .where(and(eq(outboxMessages.status, 'pending'), lte(outboxMessages.nextAttemptAt, sql`now()`)))
        .orderBy(asc(outboxMessages.nextAttemptAt))
        .limit(BATCH_SIZE)
        .for('update', { skipLocked: true });

      let sent = 0;
      for (const message of due) {
        try {
          const info = await transport.sendMail({
            from,
            to: message.toAddress,
            subject: message.subject,
            text: message.textBody,
            html: message.htmlBody ?? undefined,
          });
          await tx
            .update(outboxMessages)
            .set({ status: 'sent', sentAt: sql`now()`, smtpMessageId: info.messageId ?? null, attempts: message.attempts + 1, lastError: null })
            .where(eq(outboxMessages.id, message.id));
          sent += 1;
        } catch (error) {
          onError?.(error, message.id);
          const attempts = message.attempts + 1;
          await tx
            .update(outboxMessages)
            .set({
              attempts,
              lastError: describeError(error),
              status: attempts >= MAX_DELIVERY_ATTEMPTS ? 'failed' : 'pending',
              nextAttemptAt: sql`now() + make_interval(secs => ${retryDelayMs(attempts) / 1000})`,
            })
            .where(eq(outboxMessages.id, message.id));
        }
      }
      return { claimed: due.length, sent };
    });
  }

  async function drainOnce(): Promise<number> {
    let total = 0;
    for (;;) {
      const { claimed, sent } = await sendBatch();
      total += sent;
      // A short batch means nothing else is due; failures are rescheduled into the future.
      if (claimed < BATCH_SIZE) return total;
    }
  }

  // One drain at a time per dispatcher: the timer and an explicit drain() queue behind each other.
  let running: Promise<number> = Promise.resolve(0);
  function drain(): Promise<number> {
    const next = running.catch(() => 0).then(drainOnce);
    running = next;
    return next;
  }

  let stopped = false;
  let timer: NodeJS.Timeout | undefined;
  function schedule(): void {
    if (stopped) return;
    timer = setTimeout(() => {
      drain()
        .catch((error: unknown) => onError?.(error, '(poll)'))
        .finally(schedule);
    }, intervalMs);
    timer.unref();
  }
  schedule();

  return {
    drain,
    async stop() {
      stopped = true;
      if (timer) clearTimeout(timer);
      await running.catch(() => 0);
    },
  };
}

function describeError(error: unknown): string {
  const text = error instanceof Error ? `${error.name}: ${error.message}` : String(error);
  return text.slice(0, MAX_ERROR_LENGTH);
}
