/**
 * The demo company's staff accounts, as seeded by seeders/20261201-0001-demo-accounts.ts, and the
 * password every demo account has in a test or bench world (scripts/test-env.sh sets the same, and
 * both worlds source it, whatever the shell that started them had).
 */
export const ADMIN = 'admin@kestrel-yard.test';
export const SALES = 'sales@kestrel-yard.test';
export const WAREHOUSE = 'warehouse@kestrel-yard.test';
export const DEMO_PASSWORD = 'throwline-demo';
