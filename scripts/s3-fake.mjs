// The local stand-in for S3: s3rver on loopback, data under .data/s3-<port>, the app's bucket
// created at start. Run by scripts/services.sh; production points S3_* at a real bucket.
import { mkdirSync } from "node:fs";
import S3rver from "s3rver";

const endpoint = new URL(process.env.S3_ENDPOINT || "http://127.0.0.1:4569");
const port = Number(endpoint.port || 4569);
const bucket = process.env.S3_BUCKET || "sinkwise-attachments";
const directory = `.data/s3-${port}`;
mkdirSync(directory, { recursive: true });

const server = new S3rver({
  address: "127.0.0.1",
  port,
  directory,
  silent: true,
  // The fake's only keys; they never leave this machine.
  configureBuckets: [{ name: bucket, configs: [] }],
});

await server.run();
console.log(`[s3-fake] listening on http://127.0.0.1:${port}, bucket ${bucket}, data in ${directory}`);

const stop = () => server.close().finally(() => process.exit(0));
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
