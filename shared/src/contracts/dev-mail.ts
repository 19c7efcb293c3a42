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

/** One notification the local fake push service received and decrypted (development only: GET /api/dev/push). */
export interface DevPushMessage {
  /** ISO 8601, UTC. */
  receivedAt: string;
  /** The device list's name for the receiving subscription, when it is still subscribed. */
  device: string | null;
  title: string;
  body: string;
  /** The page the notification opens. */
  url: string;
  /** RFC 8030 headers as sent. */
  urgency: string | null;
  ttl: number | null;
}

export interface DevPushListResponse {
  /** Newest first. */
  items: DevPushMessage[];
}
