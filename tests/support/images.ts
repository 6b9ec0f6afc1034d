// Test pictures made here: a camera-like JPEG with an orientation tag and GPS position, and the
// hostile files a photo upload must refuse. The PNG bomb is written by hand (ISO/IEC 15948: the
// signature, an IHDR for 20 000 × 20 000 px, an IDAT of deflated zero rows, IEND), so its header
// declares 400 megapixels while the file stays small.
import { deflateSync } from "node:zlib";
import sharp from "sharp";

/** A JPEG that a phone might send: 640 × 400 px stored sideways with orientation 6 (rotate 90° to view), and a GPS position in its EXIF. */
export async function cameraJpeg(): Promise<Buffer> {
  return sharp({ create: { width: 640, height: 400, channels: 3, background: "#7a8b99" } })
    .composite([
      {
        input: Buffer.from(
          '<svg xmlns="http://www.w3.org/2000/svg" width="640" height="400"><rect x="40" y="40" width="200" height="120" fill="#c33"/></svg>',
        ),
      },
    ])
    .jpeg({ quality: 85 })
    .withExif({
      IFD0: { Make: "ExampleCam", Model: "Site 1" },
      IFD3: { GPSLatitudeRef: "N", GPSLatitude: "51/1 30/1 12/1", GPSLongitudeRef: "W", GPSLongitude: "0/1 7/1 30/1" },
    })
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

/** EXIF holds a GPS IFD when its pointer tag 0x8825 is there (either byte order). */
export function hasGpsPointer(exif: Buffer | undefined): boolean {
  if (!exif) return false;
  return exif.includes(Buffer.from([0x88, 0x25])) || exif.includes(Buffer.from([0x25, 0x88]));
}

function chunk(type: string, data: Buffer): Buffer {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, "ascii"), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body) >>> 0);
  return Buffer.concat([len, body, crc]);
}

// CRC-32 as PNG uses it (ISO/IEC 15948 Annex D).
function crc32(buf: Buffer): number {
  let c = ~0;
  for (const b of buf) {
    c ^= b;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  }
  return ~c;
}

/** A greyscale PNG whose header says width × height and whose data is deflated zero rows (a decompression bomb at 20 000²). */
export function pngBomb(width = 20000, height = 20000): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 0; // greyscale
  // Rows of zeros (filter byte 0 + width bytes) deflate to almost nothing; 400 MB inflates from about 400 KB.
  const rows = deflateSync(Buffer.alloc((width + 1) * height), { level: 9 });
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk("IHDR", ihdr),
    chunk("IDAT", rows),
    chunk("IEND", Buffer.alloc(0)),
  ]);
}
