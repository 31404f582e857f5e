// Applies the committed migrations in db/migrations to DATABASE_URL.
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { db, pool } from "../db";

const started = Date.now();
await migrate(db, { migrationsFolder: "db/migrations" });
console.log(`migrations applied in ${Date.now() - started} ms`);
await pool.end();
