import "server-only";
import { randomBytes } from "node:crypto";
import {
  CreateBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  NoSuchKey,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from "@aws-sdk/client-s3";
import { env } from "@/server/env";
import { ApiError } from "@/lib/http/api-error";

// One client per process, kept on globalThis so hot reload does not open a new one each time.
const holder = globalThis as unknown as { sinkwiseS3?: S3Client; sinkwiseBucket?: Promise<void> };

function client(): S3Client {
  if (!holder.sinkwiseS3) {
    const e = env();
    holder.sinkwiseS3 = new S3Client({
      region: e.S3_REGION,
      // An empty endpoint means AWS itself; anything else is an S3-compatible server,
      // which (like the local fake) rarely has DNS per bucket, so paths name the bucket.
      endpoint: e.S3_ENDPOINT || undefined,
      forcePathStyle: Boolean(e.S3_ENDPOINT),
      credentials: { accessKeyId: e.S3_ACCESS_KEY_ID, secretAccessKey: e.S3_SECRET_ACCESS_KEY },
    });
  }
  return holder.sinkwiseS3;
}

function unavailable(error: unknown): ApiError {
  console.error("[storage] object storage failed:", error instanceof Error ? error.message : error);
  return new ApiError("unavailable:storage", "File storage is not reachable right now; try again in a minute.");
}

/** Creates the bucket on first use when it is missing (the local fake starts empty). */
async function bucket(): Promise<string> {
  const name = env().S3_BUCKET;
  holder.sinkwiseBucket ??= (async () => {
    try {
      await client().send(new HeadBucketCommand({ Bucket: name }));
    } catch (error) {
      const status = error instanceof S3ServiceException ? error.$metadata.httpStatusCode : undefined;
      if (status !== 404) throw error;
      await client().send(new CreateBucketCommand({ Bucket: name }));
    }
  })().catch((error: unknown) => {
    holder.sinkwiseBucket = undefined;
    throw error;
  });
  await holder.sinkwiseBucket;
  return name;
}

/** 192 random bits: a key nobody can guess, under the part it belongs to. */
export function newObjectKey(partId: string): string {
  return `parts/${partId}/${randomBytes(24).toString("base64url")}`;
}

export async function putObject({ key, body, contentType }: { key: string; body: Uint8Array; contentType: string }): Promise<void> {
  try {
    await client().send(new PutObjectCommand({ Bucket: await bucket(), Key: key, Body: body, ContentType: contentType, ContentLength: body.byteLength }));
  } catch (error) {
    throw unavailable(error);
  }
}

/** The object's bytes as a web stream (not buffered), or undefined when it is gone. */
export async function getObjectStream({ key }: { key: string }): Promise<{ stream: ReadableStream; length?: number } | undefined> {
  try {
    const out = await client().send(new GetObjectCommand({ Bucket: await bucket(), Key: key }));
    if (!out.Body) return undefined;
    return { stream: out.Body.transformToWebStream(), length: out.ContentLength };
  } catch (error) {
    if (error instanceof NoSuchKey) return undefined;
    if (error instanceof S3ServiceException && error.$metadata.httpStatusCode === 404) return undefined;
    throw unavailable(error);
  }
}

/** Removes an object; a failure is logged, not raised (an orphan object costs only space). */
export async function deleteObject({ key }: { key: string }): Promise<void> {
  try {
    await client().send(new DeleteObjectCommand({ Bucket: await bucket(), Key: key }));
  } catch (error) {
    console.error("[storage] could not delete", key, error instanceof Error ? error.message : error);
  }
}
