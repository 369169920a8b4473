import type { DataSource } from 'typeorm';
import { HealthRepository } from '../repositories/health.repository.js';

export interface Health {
  status: 'ok' | 'error';
  db: 'up' | 'down';
}

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
