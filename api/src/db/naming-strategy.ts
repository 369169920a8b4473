import { DefaultNamingStrategy, type Table } from 'typeorm';

/**
 * Readable primary-key names (`PK_users`) instead of hashes. Other constraint and index names
 * are spelled out on the entities themselves.
 */
export class DriftmarkNamingStrategy extends DefaultNamingStrategy {
  override primaryKeyName(tableOrName: Table | string): string {
    const table = typeof tableOrName === 'string' ? tableOrName : tableOrName.name;
    return `PK_${table.split('.').pop() ?? table}`;
  }
}
