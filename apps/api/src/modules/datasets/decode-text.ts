import { HttpError } from "../../http/errors.js";

const SAVE_AS = 'Save it as "CSV UTF-8" and upload again.';

/**
 * Decodes an uploaded text file as UTF-8, refusing other encodings with the place and the cause:
 * a UTF-16 file (byte-order mark FF FE / FE FF, or zero bytes between ASCII letters) and a file
 * with bytes that are not UTF-8, such as Latin-1 or Windows-1252 text. A UTF-8 byte-order mark is
 * dropped.
 */
export function decodeText(bytes: Buffer): string {
  if (
    bytes.length >= 2 &&
    ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff))
  )
    throw utf16();
  let start = 0;
  if (bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) start = 3;
  const body = bytes.subarray(start);
  // Zero bytes are valid UTF-8 but never in a text table: here they mean UTF-16 without a mark.
  if (body.includes(0)) throw utf16();
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(body);
  } catch {
    const at = firstInvalidUtf8(body);
    const line = countLines(body, at);
    const b = body[at]!;
    // In Latin-1 every byte is a character; name it, since that is what the file most likely meant.
    const latin1 = b >= 0xa0 ? ` (in Latin-1 it reads "${String.fromCharCode(b)}")` : "";
    throw new HttpError(
      422,
      "unsupported_encoding",
      `The file is not UTF-8 text: byte 0x${b.toString(16).toUpperCase().padStart(2, "0")} on line ${line}${latin1} is not valid UTF-8, so the file is probably Latin-1 or Windows-1252. ${SAVE_AS}`,
    );
  }
}

function utf16(): HttpError {
  return new HttpError(
    422,
    "unsupported_encoding",
    `The file is UTF-16 text; Waymark reads UTF-8. ${SAVE_AS}`,
  );
}

function countLines(bytes: Buffer, end: number): number {
  let n = 1;
  for (let i = bytes.indexOf(10); i >= 0 && i < end; i = bytes.indexOf(10, i + 1)) n++;
  return n;
}

/** Offset of the first byte that breaks UTF-8 (RFC 3629 §4), by a plain scan. */
export function firstInvalidUtf8(bytes: Uint8Array): number {
  let i = 0;
  while (i < bytes.length) {
    const b = bytes[i]!;
    let need: number;
    let min: number;
    if (b < 0x80) {
      i++;
      continue;
    } else if (b >= 0xc2 && b <= 0xdf) [need, min] = [1, 0x80];
    else if (b >= 0xe0 && b <= 0xef) [need, min] = [2, 0x800];
    else if (b >= 0xf0 && b <= 0xf4) [need, min] = [3, 0x10000];
    else return i;
    let cp = b & (0x3f >> need);
    for (let k = 1; k <= need; k++) {
      const c = bytes[i + k];
      if (c === undefined || (c & 0xc0) !== 0x80) return i;
      cp = (cp << 6) | (c & 0x3f);
    }
    if (cp < min || cp > 0x10ffff || (cp >= 0xd800 && cp <= 0xdfff)) return i;
    i += need + 1;
  }
  return bytes.length;
}
