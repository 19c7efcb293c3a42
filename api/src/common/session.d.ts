import '@fastify/session';

declare module 'fastify' {
  interface Session {
    /** Set at sign-in; the only thing we keep in a session. */
    accountId?: string;
  }
}
