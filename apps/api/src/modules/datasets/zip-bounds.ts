/**
 * Reads a ZIP archive's central directory (PKWARE APPNOTE.TXT §4.3.12 and §4.3.16) without
 * inflating anything, so a workbook that would expand to gigabytes ("zip bomb") is refused
 * before the spreadsheet reader touches it.
 */
export interface ZipBounds {
  maxEntries: number;
  maxExpandedBytes: number;
}

export const XLSX_BOUNDS: ZipBounds = { maxEntries: 2000, maxExpandedBytes: 300 * 1024 * 1024 };

const EOCD_SIGNATURE = 0x06054b50;
const CENTRAL_SIGNATURE = 0x02014b50;

/** Why the archive is refused, or null when it is within bounds. */
export function zipBoundsProblem(bytes: Buffer, bounds: ZipBounds = XLSX_BOUNDS): string | null {
  // The end-of-central-directory record is 22 bytes plus a comment of up to 65,535 bytes.
  const from = Math.max(0, bytes.length - 22 - 0xffff);
  let eocd = -1;
  for (let i = bytes.length - 22; i >= from; i--) {
    if (bytes.readUInt32LE(i) === EOCD_SIGNATURE) {
      eocd = i;
      break;
    }
  }
  if (eocd < 0) return "The workbook could not be read; it may be damaged or not an .xlsx file.";
  const entries = bytes.readUInt16LE(eocd + 10);
  const cdOffset = bytes.readUInt32LE(eocd + 16);
  if (entries > bounds.maxEntries)
    return `The workbook holds ${entries} parts; Waymark reads at most ${bounds.maxEntries}.`;
  let p = cdOffset;
  let expanded = 0;
  for (let n = 0; n < entries; n++) {
    if (p + 46 > bytes.length || bytes.readUInt32LE(p) !== CENTRAL_SIGNATURE) {
      return "The workbook could not be read; it may be damaged or not an .xlsx file.";
    }
    const size = bytes.readUInt32LE(p + 24);
    // 0xFFFFFFFF means the real size is in a ZIP64 extra field: far beyond any sheet we read.
    if (size === 0xffffffff)
      return "The workbook declares a part larger than 4 GB; Waymark does not read it.";
    expanded += size;
    if (expanded > bounds.maxExpandedBytes) {
      return `The workbook would expand to more than ${Math.round(bounds.maxExpandedBytes / 1024 / 1024)} MB; Waymark does not read it.`;
    }
    p += 46 + bytes.readUInt16LE(p + 28) + bytes.readUInt16LE(p + 30) + bytes.readUInt16LE(p + 32);
  }
  return null;
}
