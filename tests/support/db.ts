// Direct database access for assertions ("nothing was written") and for building test fixtures.
export { db, pool } from "../../db";
export * as t from "../../db/schema";
