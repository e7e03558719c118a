import "server-only";
import { DeleteObjectCommand, GetObjectCommand, HeadObjectCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import { env } from "../env";

/** Short, so a copied link stops working soon after the page that made it. */
export const GET_URL_SECONDS = 300;
export const PUT_URL_SECONDS = 900;

const cache = globalThis as unknown as { __tankwrightS3?: S3Client };

/**
 * The object-store client. The checksum settings keep streamed bodies intact on the local S3 fake
 * and cost nothing on a real bucket; path style is needed for the fake and for most non-AWS stores.
 */
export function s3(): S3Client {
  if (cache.__tankwrightS3) return cache.__tankwrightS3;
  const e = env();
  cache.__tankwrightS3 = new S3Client({
    region: e.S3_REGION,
    endpoint: e.S3_ENDPOINT,
    forcePathStyle: e.S3_FORCE_PATH_STYLE || !!e.S3_ENDPOINT,
    credentials: { accessKeyId: e.S3_ACCESS_KEY_ID, secretAccessKey: e.S3_SECRET_ACCESS_KEY },
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
  return cache.__tankwrightS3;
}

const bucket = () => env().S3_BUCKET;

export async function putObject(key: string, body: Uint8Array, contentType: string): Promise<void> {
  await s3().send(new PutObjectCommand({ Bucket: bucket(), Key: key, Body: body, ContentType: contentType, ContentLength: body.byteLength }));
}

/** The object's size, or null when it isn't there. */
export async function headObject(key: string): Promise<{ size: number } | null> {
  try {
    const res = await s3().send(new HeadObjectCommand({ Bucket: bucket(), Key: key }));
    return { size: res.ContentLength ?? 0 };
  } catch (error) {
    const status = (error as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
    if (status === 404 || (error as Error).name === "NotFound" || (error as Error).name === "NoSuchKey") return null;
    throw error;
  }
}

export async function getObjectBytes(key: string): Promise<Uint8Array> {
  const res = await s3().send(new GetObjectCommand({ Bucket: bucket(), Key: key }));
  return res.Body!.transformToByteArray();
}

/** A presigned PUT the browser sends the file to; the content type is part of the signature. */
export async function presignPut(key: string, contentType: string): Promise<string> {
  return getSignedUrl(s3(), new PutObjectCommand({ Bucket: bucket(), Key: key, ContentType: contentType }), { expiresIn: PUT_URL_SECONDS });
}

/** A short-lived GET link; `fileName` sets the name a download is saved under. */
export async function presignGet(key: string, opts: { contentType: string; fileName?: string; inline?: boolean }): Promise<string> {
  const disposition = opts.fileName ? `${opts.inline === false ? "attachment" : "inline"}; filename*=UTF-8''${encodeURIComponent(opts.fileName)}` : undefined;
  return getSignedUrl(
    s3(),
    new GetObjectCommand({ Bucket: bucket(), Key: key, ResponseContentType: opts.contentType, ResponseContentDisposition: disposition }),
    { expiresIn: GET_URL_SECONDS },
  );
}

/** The object as a stream with its size, for serving through the app with our own headers. */
export async function getObjectStream(key: string): Promise<{ body: ReadableStream<Uint8Array>; size: number | undefined }> {
  const res = await s3().send(new GetObjectCommand({ Bucket: bucket(), Key: key }));
  return { body: res.Body!.transformToWebStream() as ReadableStream<Uint8Array>, size: res.ContentLength };
}

export async function deleteObject(key: string): Promise<void> {
  await s3().send(new DeleteObjectCommand({ Bucket: bucket(), Key: key }));
}
