import type { EntityManager, ObjectLiteral } from 'typeorm';

/**
 * Entities from the rows of a `RETURNING *`, each column converted as TypeORM converts what it
 * loads: a write answers with its row without reading it back.
 */
export function hydrateRows<E extends ObjectLiteral>(
  manager: EntityManager,
  entity: new () => E,
  rows: readonly Record<string, unknown>[],
): E[] {
  const metadata = manager.connection.getMetadata(entity);
  const driver = manager.connection.driver;
  return rows.map((row) => {
    const hydrated = manager.create(entity);
    for (const column of metadata.columns) {
      if (!(column.databaseName in row)) continue;
      column.setEntityValue(hydrated, driver.prepareHydratedValue(row[column.databaseName], column));
    }
    return hydrated;
  });
}
