export interface HealthResponse {
  status: 'ok' | 'error';
  checks: { database: 'up' | 'down' };
}
