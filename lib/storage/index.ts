import "server-only";
/**
 * The object store (S3-compatible) behind sign-off evidence: one client for the process and the few
 * operations Riser needs. The same code runs against the local fake (scripts/s3-fake.mjs), in tests
 * and against a hosted store; only the environment differs (lib/env.ts, S3_*).
 *
 * Checksums are computed only where an operation requires them: with the SDK's default (always),
 * the local fake stores streamed bodies corrupted without an error. Objects are
 * never public: the app streams them after its own access check.
 */
import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  HeadObjectCommand,
  ListObjectsV2Command,
  NoSuchKey,
  NotFound,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from "@aws-sdk/client-s3";
import { env } from "@/lib/env";
import { log } from "@/lib/log";

export class StorageUnavailableError extends Error {}

// The SDK is pinned to a release that runs on Node 20; its notice that later releases
// will need Node 22 would otherwise print in every process that touches storage.
process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= "true";

const globalForS3 = globalThis as unknown as { riserS3?: S3Client };

function client(): S3Client {
  if (!env.S3_BUCKET) throw new StorageUnavailableError("File storage is not configured (S3_BUCKET is not set).");
  globalForS3.riserS3 ??= new S3Client({
    region: env.S3_REGION,
    endpoint: env.S3_ENDPOINT,
    forcePathStyle: env.S3_FORCE_PATH_STYLE === "1",
    credentials: env.S3_ACCESS_KEY_ID && env.S3_SECRET_ACCESS_KEY ? { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY } : undefined,
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
    maxAttempts: 2,
  });
  return globalForS3.riserS3;
}

const bucket = () => env.S3_BUCKET!;

/** Whether an error means the store could not be reached or refused us (as opposed to a missing object). */
export function isStorageDown(err: unknown): boolean {
  if (err instanceof StorageUnavailableError) return true;
  if (err instanceof S3ServiceException) return (err.$metadata?.httpStatusCode ?? 500) >= 500 || err.name === "AccessDenied" || err.name === "InvalidAccessKeyId";
  const code = (err as { code?: string } | null)?.code;
  return code === "ECONNREFUSED" || code === "ECONNRESET" || code === "ETIMEDOUT" || code === "EHOSTUNREACH" || code === "ENOTFOUND";
}

function isMissing(err: unknown): boolean {
  return err instanceof NoSuchKey || err instanceof NotFound || (err instanceof S3ServiceException && err.$metadata?.httpStatusCode === 404);
}

export async function putObject(key: string, body: Uint8Array, contentType: string): Promise<void> {
  await client().send(new PutObjectCommand({ Bucket: bucket(), Key: key, Body: body, ContentType: contentType, ContentLength: body.byteLength }));
}

export type StoredObject = { body: ReadableStream<Uint8Array>; contentType: string | null; size: number | null };

/** The object as a web stream, or null when there is no such key. */
export async function getObject(key: string): Promise<StoredObject | null> {
  try {
    const r = await client().send(new GetObjectCommand({ Bucket: bucket(), Key: key }));
    if (!r.Body) return null;
    return { body: r.Body.transformToWebStream() as ReadableStream<Uint8Array>, contentType: r.ContentType ?? null, size: r.ContentLength ?? null };
  } catch (err) {
    if (isMissing(err)) return null;
    throw err;
  }
}

/** The whole object in memory (small objects: tests, thumbnails). */
export async function getObjectBytes(key: string): Promise<Uint8Array | null> {
  try {
    const r = await client().send(new GetObjectCommand({ Bucket: bucket(), Key: key }));
    return r.Body ? await r.Body.transformToByteArray() : null;
  } catch (err) {
    if (isMissing(err)) return null;
    throw err;
  }
}

export async function headObject(key: string): Promise<{ size: number; contentType: string | null; lastModified: Date | null } | null> {
  try {
    const r = await client().send(new HeadObjectCommand({ Bucket: bucket(), Key: key }));
    return { size: r.ContentLength ?? 0, contentType: r.ContentType ?? null, lastModified: r.LastModified ?? null };
  } catch (err) {
    if (isMissing(err)) return null;
    throw err;
  }
}

/** Deletes one object; deleting a missing key is not an error (S3 semantics). */
export async function deleteObject(key: string): Promise<void> {
  await client().send(new DeleteObjectCommand({ Bucket: bucket(), Key: key }));
}

/** Best effort, for undoing a half-finished write: never throws; what it cannot delete the cleanup job will. */
export async function deleteObjectsQuietly(keys: string[]): Promise<void> {
  await Promise.all(
    keys.map((k) =>
      deleteObject(k).catch((err) => {
        log().warn({ key: k, error: err instanceof Error ? err.message : String(err) }, "could not delete an object (the orphan clean-up job will retry)");
      }),
    ),
  );
}

export type ListedObject = { key: string; size: number; lastModified: Date };

/** Every object under a prefix, one page (up to 1000) at a time. */
export async function* listObjects(prefix: string): AsyncGenerator<ListedObject[]> {
  let token: string | undefined;
  do {
    const r = await client().send(new ListObjectsV2Command({ Bucket: bucket(), Prefix: prefix, ContinuationToken: token, MaxKeys: 1000 }));
    yield (r.Contents ?? []).filter((o) => o.Key).map((o) => ({ key: o.Key!, size: o.Size ?? 0, lastModified: o.LastModified ?? new Date(0) }));
    token = r.IsTruncated ? r.NextContinuationToken : undefined;
  } while (token);
}

/** Whether the bucket answers (readiness): throws when the store is unreachable or refuses us. */
export async function storeReachable(timeoutMs = 2_500): Promise<void> {
  await client().send(new HeadBucketCommand({ Bucket: bucket() }), { abortSignal: AbortSignal.timeout(timeoutMs) });
}
