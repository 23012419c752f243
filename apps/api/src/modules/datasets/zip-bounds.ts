import zlib from "node:zlib";
import { HttpError } from "../../http/errors.js";

/**
 * Reads a ZIP archive (PKWARE APPNOTE.TXT §4.3.7, §4.3.12, §4.3.16) with every size bounded.
 * The central directory's declared sizes may refuse a file early, but they are never trusted to
 * let one through: each part is inflated in small steps with a running count of the bytes it
 * produced, and inflation stops as soon as the count passes the bound ("zip bomb").
 */
export interface ZipBounds {
  maxEntries: number;
  /** Bytes all parts read from one archive may expand to, counted while inflating. */
  maxExpandedBytes: number;
}

export const XLSX_BOUNDS: ZipBounds = { maxEntries: 2000, maxExpandedBytes: 100 * 1024 * 1024 };

const EOCD_SIGNATURE = 0x06054b50;
const CENTRAL_SIGNATURE = 0x02014b50;
const LOCAL_SIGNATURE = 0x04034b50;
/** Inflated bytes per piece handed on: the count is checked after each. */
const INFLATE_CHUNK = 256 * 1024;

const DAMAGED = "The workbook could not be read; it may be damaged or not an .xlsx file.";

export interface ZipEntry {
  name: string;
  method: number;
  compressedSize: number;
  declaredSize: number;
  localOffset: number;
}

function damaged(): HttpError {
  return new HttpError(422, "invalid_file", DAMAGED);
}

function mb(bytes: number): string {
  return `${Math.round(bytes / 1024 / 1024)} MB`;
}

/** The archive's parts from its central directory; throws a 4xx naming the problem. */
export function listZipEntries(bytes: Buffer, bounds: ZipBounds = XLSX_BOUNDS): ZipEntry[] {
  // The end-of-central-directory record is 22 bytes plus a comment of up to 65,535 bytes.
  const from = Math.max(0, bytes.length - 22 - 0xffff);
  let eocd = -1;
  for (let i = bytes.length - 22; i >= from; i--) {
    if (bytes.readUInt32LE(i) === EOCD_SIGNATURE) {
      eocd = i;
      break;
    }
  }
  if (eocd < 0) throw damaged();
  const count = bytes.readUInt16LE(eocd + 10);
  if (count > bounds.maxEntries)
    throw new HttpError(
      422,
      "invalid_file",
      `The workbook holds ${count} parts; Waymark reads at most ${bounds.maxEntries}.`,
    );
  const entries: ZipEntry[] = [];
  let p = bytes.readUInt32LE(eocd + 16);
  let declared = 0;
  for (let n = 0; n < count; n++) {
    if (p + 46 > bytes.length || bytes.readUInt32LE(p) !== CENTRAL_SIGNATURE) throw damaged();
    const nameLength = bytes.readUInt16LE(p + 28);
    const entry: ZipEntry = {
      method: bytes.readUInt16LE(p + 10),
      compressedSize: bytes.readUInt32LE(p + 20),
      declaredSize: bytes.readUInt32LE(p + 24),
      localOffset: bytes.readUInt32LE(p + 42),
      name: bytes.toString("utf8", p + 46, Math.min(bytes.length, p + 46 + nameLength)),
    };
    // 0xFFFFFFFF means the real size is in a ZIP64 extra field: far beyond any sheet we read.
    if (entry.declaredSize === 0xffffffff || entry.compressedSize === 0xffffffff)
      throw new HttpError(
        413,
        "file_too_large_unpacked",
        "The workbook declares a part larger than 4 GB; Waymark does not read it.",
      );
    // A declared size may refuse early; a small declared size proves nothing (see inflateEntry).
    declared += entry.declaredSize;
    if (declared > bounds.maxExpandedBytes) throw expandsTooFar(bounds);
    entries.push(entry);
    p += 46 + nameLength + bytes.readUInt16LE(p + 30) + bytes.readUInt16LE(p + 32);
  }
  return entries;
}

function expandsTooFar(bounds: ZipBounds, part?: string): HttpError {
  return new HttpError(
    413,
    "file_too_large_unpacked",
    `The workbook would expand to more than ${mb(bounds.maxExpandedBytes)}${part ? ` (while unpacking ${part})` : ""}; Waymark does not read it.`,
  );
}

/** A running count of inflated bytes shared by all parts read from one archive. */
export class InflateBudget {
  used = 0;
  constructor(readonly bounds: ZipBounds = XLSX_BOUNDS) {}
  spend(n: number, part: string): void {
    this.used += n;
    if (this.used > this.bounds.maxExpandedBytes) throw expandsTooFar(this.bounds, part);
  }
}

/**
 * Inflates one part with Node's zlib (native), handing each 256 KB piece to `onChunk` and charging
 * it to `budget` as it comes; a bomb is stopped within one piece of passing the bound.
 */
export async function inflateEntry(
  bytes: Buffer,
  entry: ZipEntry,
  budget: InflateBudget,
  onChunk: (chunk: Uint8Array) => void,
): Promise<void> {
  const p = entry.localOffset;
  if (p + 30 > bytes.length || bytes.readUInt32LE(p) !== LOCAL_SIGNATURE) throw damaged();
  const start = p + 30 + bytes.readUInt16LE(p + 26) + bytes.readUInt16LE(p + 28);
  const end = start + entry.compressedSize;
  if (end > bytes.length) throw damaged();
  if (entry.method === 0) {
    for (let at = start; at < end; at += INFLATE_CHUNK) {
      const chunk = bytes.subarray(at, Math.min(end, at + INFLATE_CHUNK));
      budget.spend(chunk.length, entry.name);
      onChunk(chunk);
    }
    return;
  }
  if (entry.method !== 8) throw damaged();
  await new Promise<void>((resolve, reject) => {
    const inflater = zlib.createInflateRaw({ chunkSize: INFLATE_CHUNK });
    let failed = false;
    inflater.on("data", (chunk: Buffer) => {
      if (failed) return;
      try {
        budget.spend(chunk.length, entry.name);
        onChunk(chunk);
      } catch (e) {
        failed = true;
        inflater.destroy();
        reject(e);
      }
    });
    inflater.on("end", () => resolve());
    inflater.on("error", () => {
      if (!failed) reject(damaged());
    });
    inflater.end(bytes.subarray(start, end));
  });
}
