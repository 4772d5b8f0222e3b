import type { Db } from "../index";

/**
 * A query built once per database handle (drizzle `.prepare()` with `sql.placeholder`s) for the
 * look-ups that run on nearly every request: building the SQL costs more than running it.
 */
export function preparedFor<T>(build: (database: Db) => T): (database: Db) => T {
  const built = new WeakMap<Db, T>();
  return (database) => {
    let query = built.get(database);
    if (query === undefined) built.set(database, (query = build(database)));
    return query;
  };
}
