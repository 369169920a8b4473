import type { DataSource } from 'typeorm';

export class HealthRepository {
  constructor(private readonly dataSource: DataSource) {}

  /** Runs `SELECT 1`; rejects when the pool is closed or the server does not answer in time. */
  async ping(timeoutMs = 2000): Promise<void> {
    if (!this.dataSource.isInitialized) throw new Error('Data source is not initialized');
    let timer: NodeJS.Timeout | undefined;
    const timeout = new Promise<never>((_, reject) => {
      timer = setTimeout(
        () => reject(new Error(`Database did not answer within ${timeoutMs} ms`)),
        timeoutMs,
      );
    });
    try {
      await Promise.race([this.dataSource.query('SELECT 1'), timeout]);
    } finally {
      clearTimeout(timer);
    }
  }
}
