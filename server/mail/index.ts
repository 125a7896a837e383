export { createMailTransport, type MailTransportOptions } from './mail-transport';
export { startSmtpFake, SMTP_FAKE_MAX_MESSAGE_BYTES, type SmtpFake, type SmtpFakeOptions } from './smtp-fake';
export { enqueueMail, type OutgoingMail } from './enqueue-mail';
export {
  startOutboxDispatcher,
  retryDelayMs,
  MAX_DELIVERY_ATTEMPTS,
  type OutboxDispatcher,
  type OutboxDispatcherOptions,
} from './outbox-dispatcher';
