import "server-only";
import decodeHeic from "heic-decode";
import sharp from "sharp";
import { pixelRefusal } from "@/lib/install/upload-rules";
import { unprocessable } from "@/server/errors";

const DAMAGED = "The HEIC photo couldn't be read; it may be damaged or cut short. Take it again, or share it as JPEG.";

/**
 * Turns an iPhone's HEIC photo into a JPEG. libheif (WebAssembly, in-process) parses the file first,
 * which gives each image's size from its header; the pixel cap is checked then, before the image is
 * decoded, so a file claiming a huge picture costs no memory. The first image is the primary one; its
 * rotation and mirroring are applied by libheif while decoding. The JPEG keeps no metadata.
 */
export async function heicToJpeg(bytes: Uint8Array): Promise<Uint8Array> {
  let images: Awaited<ReturnType<typeof decodeHeic.all>>;
  try {
    images = await decodeHeic.all({ buffer: bytes });
  } catch {
    throw unprocessable(DAMAGED);
  }
  try {
    const first = images[0];
    const tooBig = pixelRefusal(first?.width ?? 0, first?.height ?? 0);
    if (tooBig) throw unprocessable(tooBig);
    let decoded: { width: number; height: number; data: Uint8ClampedArray };
    try {
      decoded = await first.decode();
    } catch {
      throw unprocessable(DAMAGED);
    }
    try {
      const jpeg = await sharp(Buffer.from(decoded.data.buffer, decoded.data.byteOffset, decoded.data.byteLength), {
        raw: { width: decoded.width, height: decoded.height, channels: 4 },
      })
        .flatten({ background: "#ffffff" })
        .jpeg({ quality: 90 })
        .toBuffer();
      return new Uint8Array(jpeg);
    } catch {
      throw unprocessable(DAMAGED);
    }
  } finally {
    images.dispose();
  }
}
