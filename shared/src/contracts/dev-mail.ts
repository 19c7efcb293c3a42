/** One message the local fake SMTP server received (development only: GET /api/dev/mail). */
export interface DevMailMessage {
  /** Envelope recipients. */
  to: string[];
  from: string;
  subject: string;
  /** ISO 8601, UTC: when the fake server received it. */
  date: string;
  text: string;
  /** Null when the message had no HTML part. */
  html: string | null;
  /** With angle brackets, as in the header. */
  messageId: string | null;
}

export interface DevMailListResponse {
  /** Newest first. */
  items: DevMailMessage[];
}
