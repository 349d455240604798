// Who a person is to Trimrail: one role per account (better-auth user field), and the display
// units they chose. Pure vocabulary, imported by the database schema, the server and the client.

export const ROLES = ["customer", "support", "maker"] as const;
export type Role = (typeof ROLES)[number];

export const STAFF_ROLES = ["support", "maker"] as const satisfies readonly Role[];
export const MAKER_ONLY = ["maker"] as const satisfies readonly Role[];
export const CUSTOMER_ONLY = ["customer"] as const satisfies readonly Role[];

export const UNIT_SYSTEMS = ["metric", "imperial"] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

export const isRole = (value: unknown): value is Role => (ROLES as readonly unknown[]).includes(value);
export const isUnitSystem = (value: unknown): value is UnitSystem => (UNIT_SYSTEMS as readonly unknown[]).includes(value);
