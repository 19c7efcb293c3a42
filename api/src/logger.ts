import type { LoggerService } from '@nestjs/common';
import { pino, type Logger } from 'pino';

/** One pino logger for Fastify's request logs and Nest's own messages, so all logs are JSON. */
export function createLogger(level: string): Logger {
  return pino({
    level,
    // Belt and braces: request logging never includes bodies, but if anyone logs an object with
    // these keys they are blanked rather than written to disk.
    redact: {
      paths: [
        'password',
        '*.password',
        'currentPassword',
        'newPassword',
        'req.headers.cookie',
        'res.headers["set-cookie"]',
      ],
      censor: '[redacted]',
    },
  });
}

export class NestPinoLogger implements LoggerService {
  constructor(private readonly logger: Logger) {}

  log(message: unknown, context?: string) {
    this.logger.info({ context }, String(message));
  }
  error(message: unknown, trace?: string, context?: string) {
    this.logger.error({ context, trace }, String(message));
  }
  warn(message: unknown, context?: string) {
    this.logger.warn({ context }, String(message));
  }
  debug(message: unknown, context?: string) {
    this.logger.debug({ context }, String(message));
  }
  verbose(message: unknown, context?: string) {
    this.logger.trace({ context }, String(message));
  }
}
