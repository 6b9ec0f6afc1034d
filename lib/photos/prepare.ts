// Site photos as the build log takes them: JPEG, PNG or WebP by their content (the file's own
// signature, not its name or declared type), at most 15 MB and 40 megapixels — the size read from
// the header and refused before anything is decoded, so a decompression bomb is a clear refusal
// and not a crash — turned upright by their orientation tag and written again without any metadata
// (GPS included), with a 480 px thumbnail.
import sharp from "sharp";
import { AppError } from "@/lib/server/errors";
import { PHOTO_MAX_BYTES } from "@/lib/validation/limits";

export const PHOTO_MAX_PIXELS = 40_000_000;
export const THUMB_WIDTH = 480;

type Kind = "jpeg" | "png" | "webp";
const TYPE: Record<Kind, string> = { jpeg: "image/jpeg", png: "image/png", webp: "image/webp" };
export const PHOTO_EXTENSION: Record<string, string> = {
  "image/jpeg": "jpg",
  "image/png": "png",
  "image/webp": "webp",
};

/** The format by its signature: JPEG SOI (ITU-T T.81 Annex B), the PNG signature (ISO/IEC 15948 §5.2), a RIFF container of WEBP (RFC 9649 §2.5). */
export function sniffImage(b: Uint8Array): Kind | null {
  if (b.length >= 3 && b[0] === 0xff && b[1] === 0xd8 && b[2] === 0xff) return "jpeg";
  if (b.length >= 8 && [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a].every((v, i) => b[i] === v)) return "png";
  if (
    b.length >= 12 &&
    String.fromCharCode(...b.subarray(0, 4)) === "RIFF" &&
    String.fromCharCode(...b.subarray(8, 12)) === "WEBP"
  )
    return "webp";
  return null;
}

export interface PreparedPhoto {
  data: Buffer;
  contentType: string;
  width: number;
  height: number;
  thumb: Buffer;
  thumbType: string;
  name: string;
}

const mp = (px: number) => `${(px / 1e6).toFixed(px < 1e7 ? 1 : 0)} megapixels`;

export async function preparePhoto(bytes: Buffer, name: string): Promise<PreparedPhoto> {
  const label = name ? `"${name.slice(0, 80)}"` : "The photo";
  if (bytes.length > PHOTO_MAX_BYTES)
    throw new AppError(
      "too_large",
      `${label} is ${(bytes.length / 1048576).toFixed(1)} MB; a photo may be at most 15 MB.`,
    );
  const kind = sniffImage(bytes);
  if (!kind)
    throw new AppError(
      "unsupported",
      `${label} is not a JPEG, PNG or WebP picture (judged by its content, not its name). Photos of other kinds, drawings (SVG) and programs are not taken.`,
    );
  let meta: Awaited<ReturnType<ReturnType<typeof sharp>["metadata"]>>;
  try {
    // Only the header is read here; nothing is decoded.
    meta = await sharp(bytes, { limitInputPixels: false }).metadata();
  } catch {
    throw new AppError(
      "unprocessable",
      `${label} looks like a ${kind.toUpperCase()} but cannot be read: it may be damaged or cut short.`,
    );
  }
  if (meta.format !== kind)
    throw new AppError("unsupported", `${label} says it is a ${kind.toUpperCase()} but is not one inside.`);
  const pixels = (meta.width ?? 0) * (meta.height ?? 0);
  if (!(pixels > 0)) throw new AppError("unprocessable", `${label} has no picture size in it: it may be damaged.`);
  if (pixels > PHOTO_MAX_PIXELS)
    throw new AppError(
      "too_large",
      `${label} is ${meta.width} × ${meta.height} px (${mp(pixels)}); a photo may be at most ${mp(PHOTO_MAX_PIXELS)}. Resize it and try again.`,
    );
  try {
    // failOn "warning": a truncated or corrupt file is refused rather than stored half grey.
    const upright = sharp(bytes, { limitInputPixels: PHOTO_MAX_PIXELS, failOn: "warning" }).rotate();
    // Written again, with no metadata kept (sharp drops EXIF, XMP and IPTC unless asked to keep them).
    const out =
      kind === "jpeg"
        ? upright.jpeg({ quality: 86, mozjpeg: true })
        : kind === "png"
          ? upright.png({ compressionLevel: 8 })
          : upright.webp({ quality: 86 });
    const { data, info } = await out.toBuffer({ resolveWithObject: true });
    const thumb = await sharp(data)
      .resize({ width: THUMB_WIDTH, withoutEnlargement: true })
      .webp({ quality: 76 })
      .toBuffer();
    return {
      data,
      contentType: TYPE[kind],
      width: info.width,
      height: info.height,
      thumb,
      thumbType: "image/webp",
      name: name.slice(0, 200),
    };
  } catch (error) {
    if (error instanceof AppError) throw error;
    throw new AppError("unprocessable", `${label} could not be read as a picture: it may be damaged or cut short.`);
  }
}
