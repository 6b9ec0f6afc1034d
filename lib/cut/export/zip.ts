// Node only: the job's files with their PNG previews (png.ts), packed into one ZIP by archiver
// (ZIP per PKWARE's APPNOTE.TXT, deflate per RFC 1951).
import { ZipArchive } from "archiver";
import { jobTextFiles, type JobFile, type JobInput } from "./job";
import { svgToPng } from "./png";

/** All files of the job, the PNG previews rendered one after another. */
export async function jobFiles(j: JobInput, opts: { pngWidth?: number } = {}): Promise<JobFile[]> {
  const { files, previews } = jobTextFiles(j);
  const out = [...files];
  for (const p of previews) out.push({ name: p.name, data: await svgToPng(p.svg, opts.pngWidth ?? 1600) });
  return out.sort((a, b) => a.name.localeCompare(b.name));
}

/** A ZIP stream of the given files (pipe it to a response or a file). */
export function zipStream(files: JobFile[], folder = ""): ZipArchive {
  const zip = new ZipArchive({ zlib: { level: 9 } });
  for (const f of files)
    zip.append(typeof f.data === "string" ? Buffer.from(f.data, "utf8") : f.data, {
      name: folder ? `${folder}/${f.name}` : f.name,
    });
  void zip.finalize();
  return zip;
}

/** The ZIP as one buffer. */
export async function zipFiles(files: JobFile[], folder = ""): Promise<Buffer> {
  const zip = zipStream(files, folder);
  const chunks: Buffer[] = [];
  await new Promise<void>((resolve, reject) => {
    zip.on("data", (c: Buffer) => chunks.push(c));
    zip.on("end", () => resolve());
    zip.on("error", reject);
  });
  return Buffer.concat(chunks);
}

export async function jobZip(j: JobInput, opts: { pngWidth?: number } = {}): Promise<Buffer> {
  return zipFiles(await jobFiles(j, opts), j.baseName);
}
