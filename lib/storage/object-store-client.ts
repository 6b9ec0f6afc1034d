// The one way to build the object store's client (@aws-sdk/client-s3), for the app (lib/server/
// storage.ts), the seed, the backup scripts and the tests: the same variables everywhere (S3_ENDPOINT,
// S3_REGION, S3_ACCESS_KEY_ID, S3_SECRET_ACCESS_KEY), path-style addressing (what S3-compatible stores
// and the local fake need), and a short wait before a store that does not answer is a clear failure.
// Plain module (no "server-only"), so scripts run by tsx can use it too.
import { S3Client } from "@aws-sdk/client-s3";
import { OBJECT_STORE_CONNECT_TIMEOUT_MS, OBJECT_STORE_REQUEST_TIMEOUT_MS } from "@/lib/validation/limits";

export interface ObjectStoreSettings {
  endpoint?: string;
  region: string;
  accessKeyId: string;
  secretAccessKey: string;
}

type Env = Record<string, string | undefined>;

export function objectStoreSettings(env: Env = process.env): ObjectStoreSettings {
  return {
    endpoint: env.S3_ENDPOINT,
    region: env.S3_REGION ?? "us-east-1",
    accessKeyId: env.S3_ACCESS_KEY_ID ?? "",
    secretAccessKey: env.S3_SECRET_ACCESS_KEY ?? "",
  };
}

export function objectStoreClient(s: ObjectStoreSettings = objectStoreSettings()): S3Client {
  return new S3Client({
    endpoint: s.endpoint,
    region: s.region,
    forcePathStyle: true,
    credentials: { accessKeyId: s.accessKeyId, secretAccessKey: s.secretAccessKey },
    maxAttempts: 2,
    requestHandler: {
      connectionTimeout: OBJECT_STORE_CONNECT_TIMEOUT_MS,
      requestTimeout: OBJECT_STORE_REQUEST_TIMEOUT_MS,
    },
  });
}
