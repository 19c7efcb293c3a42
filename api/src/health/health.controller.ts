import { Controller, Get, Inject, Res } from '@nestjs/common';
import { ApiOkResponse, ApiServiceUnavailableResponse, ApiTags } from '@nestjs/swagger';
import type { HealthResponse } from '@peakwise/shared';
import type { FastifyReply } from 'fastify';
import { sql } from 'kysely';
import { Public } from '../common/auth.decorators.js';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';

const VERSION = process.env.npm_package_version ?? '0.1.0';

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  /** 200 when the database answers, 503 otherwise, so a monitor needs only the status code. */
  @Public()
  @Get()
  @ApiOkResponse({ description: 'Database reachable' })
  @ApiServiceUnavailableResponse({ description: 'Database unreachable' })
  async check(@Res({ passthrough: true }) reply: FastifyReply): Promise<HealthResponse> {
    const started = performance.now();
    try {
      await sql`SELECT 1`.execute(this.db);
      const latencyMs = Math.round((performance.now() - started) * 10) / 10;
      return { status: 'ok', database: { status: 'up', latencyMs }, version: VERSION };
    } catch {
      void reply.status(503);
      return { status: 'degraded', database: { status: 'down', latencyMs: null }, version: VERSION };
    }
  }
}
