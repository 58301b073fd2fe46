export { retryDelayMs, BASE_RETRY_DELAY_MS, MAX_RETRY_DELAY_MS } from "./backoff";
export { enqueueMail, messageIdHost, InvalidMailError, type EnqueueOptions, type MailMessage } from "./outbox";
export {
  deliverDueMail,
  describeSendError,
  type DeliverOptions,
  type DeliveryProblem,
  type DeliveryResult,
} from "./sender";
export { createSmtpTransport, smtpOptionsFromUrl, type MailTransport, type OutgoingMail } from "./transport";
export {
  runningMailSender,
  startMailSender,
  summarizeDelivery,
  type MailLog,
  type MailSender,
  type MailSenderOptions,
} from "./worker";
