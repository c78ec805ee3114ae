/** What the app asks to send; the transport, headers and sender are the mail service's business. */
export interface MailMessage {
  to: string | string[];
  subject: string;
  text: string;
  html: string;
  /** What the message is for, e.g. `invitation`; shown in the outbox and used to find it in tests. */
  kind: string;
  /** The group the message concerns, so that group's organisers can read it in the outbox. */
  groupId?: string;
}

export const KIND_HEADER = 'X-Homeground-Kind';
export const GROUP_HEADER = 'X-Homeground-Group';
