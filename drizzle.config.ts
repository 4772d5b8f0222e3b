import { defineConfig } from "drizzle-kit";

export default defineConfig({
  schema: ["./db/schema.ts", "./db/auth-schema.ts", "./db/limits-schema.ts"],
  out: "./db/migrations",
  dialect: "turso",
  dbCredentials: {
    url: process.env.DATABASE_URL ?? "file:./data/knotwork.db",
    authToken: process.env.DATABASE_AUTH_TOKEN,
  },
});
