// A local stand-in for the object store, for development and tests: s3rver (an S3-compatible
// server for Node) on loopback, its objects kept in a folder under .data/, the app's bucket made on
// start. The app reaches it through @aws-sdk/client-s3 exactly as it would a hosted store.
import S3rver from "s3rver";

const port = Number(process.env.S3_PORT ?? 2528);
const directory = process.env.S3_DATA_DIR;
const bucket = process.env.S3_BUCKET ?? "axlewright";
if (!directory) {
  console.error("S3_DATA_DIR is not set");
  process.exit(1);
}

const server = new S3rver({
  port,
  address: "127.0.0.1",
  directory,
  silent: true,
  configureBuckets: [{ name: bucket }],
});
await server.run();

const stop = () => server.close().then(() => process.exit(0));
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
