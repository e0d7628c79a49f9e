import type { Knex } from "knex";

/**
 * A column of values bound as one PostgreSQL array (for `unnest(?::float8[], …)`).
 * pg sends null elements as NULL; knex's binding type only lists arrays without
 * nulls, hence this one typed widening.
 */
export function arrayBinding(values: readonly (string | number | boolean | null)[]): Knex.Value {
  return values as unknown as Knex.Value;
}
