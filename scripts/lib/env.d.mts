// Types of env.mjs for the TypeScript scripts that read a stack's settings (scripts/lib/backup-common.ts).
export interface StackSettings {
  dataDir: string;
  dbPort: number;
  appPort: number;
  database: string;
  dbUser: string;
  dbPassword: string;
  /** The environment the app runs with: DATABASE_URL, S3_ENDPOINT, S3_BUCKET, … */
  env: Record<string, string | undefined>;
}

/** The demo stack of `npm start` (its secrets from .env.local, made there when missing). */
export function demoSettings(): StackSettings;

/** The throw-away stack of `npm test`. */
export function testSettings(): StackSettings;
