// Local S3-compatible object store for development and tests (s3rver), on loopback only.
// The app reaches it through @aws-sdk/client-s3 exactly as it would a real bucket.
import S3rver from "s3rver";
import { mkdirSync } from "node:fs";

const port = Number(process.env.S3_PORT ?? 4569);
const directory = process.env.S3_DIR ?? ".data/s3";
const bucket = process.env.S3_BUCKET ?? "tearline-photos";
mkdirSync(directory, { recursive: true });

const server = new S3rver({
  port,
  address: "127.0.0.1",
  directory,
  silent: true,
  configureBuckets: [{ name: bucket, configs: [] }],
});

server.run().then(
  () => console.log(`object store fake on http://127.0.0.1:${port} (bucket ${bucket}, data in ${directory})`),
  (err: Error) => {
    console.error(`object store fake failed to start: ${err.message}`);
    process.exit(1);
  },
);

for (const sig of ["SIGINT", "SIGTERM"] as const) {
  process.on(sig, () => server.close().finally(() => process.exit(0)));
}
