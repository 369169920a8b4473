import type { HealthResponse } from '@driftmark/shared';
import type { DataSource } from 'typeorm';
import { HealthRepository } from '../repositories/health.repository.js';

export type Health = HealthResponse;

export class HealthService {
  constructor(private readonly deps: { dataSource: DataSource }) {}

  async check(): Promise<Health> {
    try {
      await new HealthRepository(this.deps.dataSource).ping();
      return { status: 'ok', db: 'up' };
    } catch {
      return { status: 'error', db: 'down' };
    }
  }
}
