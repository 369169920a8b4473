import type { DataSource } from 'typeorm';

/** Every table the entities map, emptied in one statement (CASCADE follows the foreign keys). */
export async function truncateAll(dataSource: DataSource): Promise<void> {
  const tables = dataSource.entityMetadatas.map((m) => `"${m.tableName}"`).join(', ');
  await dataSource.query(`TRUNCATE ${tables} RESTART IDENTITY CASCADE`);
}
