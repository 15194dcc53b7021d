import { boolean, index, integer, pgTable, primaryKey, text, timestamp } from "drizzle-orm/pg-core";

/**
 * Personal API tokens (docs/decisions/024-api-tokens.md).
 *
 * `apikey` is the table of better-auth's API-key plugin (`@better-auth/api-key`
 * 1.7), written by hand from the plugin's documented schema (its field list in
 * `apiKeySchema`: names, types, required, defaults and indexes) because the
 * schema CLI of better-auth 1.7 needs Node 22. Field names are the plugin's
 * (the drizzle adapter maps them by key); columns are snake_case like the
 * generated auth tables. Only the plugin writes it: `key` holds the SHA-256
 * hash of the token, never the token; `metadata` holds the team and role the
 * token acts with (JSON text, written by our service, never by a client).
 *
 * `api_token_address` is ours: the client addresses a token has been used
 * from, so that a use from a new address is written to the audit trail once.
 */
export const apikey = pgTable(
  "apikey",
  {
    id: text("id").primaryKey(),
    configId: text("config_id").default("default").notNull(),
    name: text("name"),
    start: text("start"),
    referenceId: text("reference_id").notNull(),
    prefix: text("prefix"),
    key: text("key").notNull(),
    refillInterval: integer("refill_interval"),
    refillAmount: integer("refill_amount"),
    lastRefillAt: timestamp("last_refill_at"),
    enabled: boolean("enabled").default(true),
    rateLimitEnabled: boolean("rate_limit_enabled").default(true),
    rateLimitTimeWindow: integer("rate_limit_time_window"),
    rateLimitMax: integer("rate_limit_max"),
    requestCount: integer("request_count").default(0),
    remaining: integer("remaining"),
    lastRequest: timestamp("last_request"),
    expiresAt: timestamp("expires_at"),
    createdAt: timestamp("created_at").notNull(),
    updatedAt: timestamp("updated_at").notNull(),
    permissions: text("permissions"),
    metadata: text("metadata"),
  },
  (table) => [
    index("apikey_configId_idx").on(table.configId),
    index("apikey_referenceId_idx").on(table.referenceId),
    index("apikey_key_idx").on(table.key),
  ],
);

export const apiTokenAddress = pgTable(
  "api_token_address",
  {
    tokenId: text("token_id")
      .notNull()
      .references(() => apikey.id, { onDelete: "cascade" }),
    address: text("address").notNull(),
    firstSeenAt: timestamp("first_seen_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [primaryKey({ columns: [table.tokenId, table.address] })],
);

export type ApiKeyRow = typeof apikey.$inferSelect;
