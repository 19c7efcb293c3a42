export interface HealthResponse {
  status: 'ok' | 'degraded';
  database: { status: 'up' | 'down'; latencyMs: number | null };
  version: string;
}
