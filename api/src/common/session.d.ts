import '@fastify/session';

declare module 'fastify' {
  interface Session {
    /** Set at sign-in. */
    accountId?: string;
    /** The account's session_epoch at sign-in (sql/0012); absent in sessions from before it, read as 0. */
    sessionEpoch?: number;
  }
}
