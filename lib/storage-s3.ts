import { DeleteObjectCommand, GetObjectCommand, HeadObjectCommand, PutObjectCommand, S3Client, S3ServiceException } from '@aws-sdk/client-s3';

/**
 * The object-storage driver for uploads: any S3-compatible service through the AWS SDK. It is used when
 * S3_BUCKET is set (lib/storage.ts decides); local disk stays the default. Keys are the same opaque UUIDs
 * the disk driver uses, under an optional S3_PREFIX.
 *
 * Settings: S3_BUCKET, S3_ENDPOINT (for a non-AWS service or the local fake), S3_REGION (default us-east-1),
 * S3_ACCESS_KEY_ID / S3_SECRET_ACCESS_KEY (else the SDK's own credential chain), S3_FORCE_PATH_STYLE
 * (default on when an endpoint is given), S3_PREFIX.
 */

export function s3Enabled(): boolean {
  return Boolean(process.env.S3_BUCKET);
}

let cached: { signature: string; client: S3Client } | null = null;

function settings() {
  const endpoint = process.env.S3_ENDPOINT || undefined;
  return {
    bucket: process.env.S3_BUCKET!,
    prefix: process.env.S3_PREFIX ?? '',
    endpoint,
    region: process.env.S3_REGION ?? 'us-east-1',
    forcePathStyle: process.env.S3_FORCE_PATH_STYLE ? process.env.S3_FORCE_PATH_STYLE === 'true' : Boolean(endpoint),
    accessKeyId: process.env.S3_ACCESS_KEY_ID,
    secretAccessKey: process.env.S3_SECRET_ACCESS_KEY,
  };
}

function client(): S3Client {
  const s = settings();
  const signature = JSON.stringify(s);
  if (cached?.signature !== signature) {
    cached?.client.destroy();
    cached = {
      signature,
      client: new S3Client({
        region: s.region,
        endpoint: s.endpoint,
        forcePathStyle: s.forcePathStyle,
        credentials: s.accessKeyId && s.secretAccessKey ? { accessKeyId: s.accessKeyId, secretAccessKey: s.secretAccessKey } : undefined,
        // Checksums only where the protocol requires them: S3-compatible services (and the test fake) that do
        // not speak the newer checksum headers otherwise store streamed bodies corrupted.
        requestChecksumCalculation: 'WHEN_REQUIRED',
        responseChecksumValidation: 'WHEN_REQUIRED',
      }),
    };
  }
  return cached.client;
}

const objectKey = (key: string) => `${settings().prefix}${key}`;

function isMissing(err: unknown): boolean {
  return err instanceof S3ServiceException && (err.name === 'NoSuchKey' || err.name === 'NotFound' || err.$metadata?.httpStatusCode === 404);
}

export async function s3Put(key: string, bytes: Uint8Array): Promise<void> {
  await client().send(new PutObjectCommand({ Bucket: settings().bucket, Key: objectKey(key), Body: bytes, ContentLength: bytes.byteLength }));
}

export async function s3Stream(key: string): Promise<{ stream: ReadableStream<Uint8Array>; bytes: number } | null> {
  try {
    const res = await client().send(new GetObjectCommand({ Bucket: settings().bucket, Key: objectKey(key) }));
    if (!res.Body) return null;
    return { stream: res.Body.transformToWebStream() as ReadableStream<Uint8Array>, bytes: Number(res.ContentLength ?? 0) };
  } catch (err) {
    if (isMissing(err)) return null;
    throw err;
  }
}

export async function s3Get(key: string): Promise<Buffer | null> {
  try {
    const res = await client().send(new GetObjectCommand({ Bucket: settings().bucket, Key: objectKey(key) }));
    return res.Body ? Buffer.from(await res.Body.transformToByteArray()) : null;
  } catch (err) {
    if (isMissing(err)) return null;
    throw err;
  }
}

/** True if something was removed (S3's delete answers alike either way, so ask first). */
export async function s3Delete(key: string): Promise<boolean> {
  const { bucket } = settings();
  try {
    await client().send(new HeadObjectCommand({ Bucket: bucket, Key: objectKey(key) }));
  } catch (err) {
    if (isMissing(err)) return false;
    throw err;
  }
  await client().send(new DeleteObjectCommand({ Bucket: bucket, Key: objectKey(key) }));
  return true;
}
