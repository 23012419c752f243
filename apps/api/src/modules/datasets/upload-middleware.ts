import type { RequestHandler } from "express";
import multer from "multer";
import { toHttpError } from "../../http/error-handler.js";
import { HttpError } from "../../http/errors.js";

/** One file in memory, size-limited; multer's own errors become our error shape. */
export function singleFileUpload(limitMb: number): RequestHandler {
  const upload = multer({
    storage: multer.memoryStorage(),
    // Browsers send file names as UTF-8 without saying so; busboy's default would read "Müller" as "MÃ¼ller".
    defParamCharset: "utf8",
    limits: { fileSize: limitMb * 1024 * 1024, files: 1, fields: 20 },
  }).single("file");
  return (req, res, next) => {
    upload(req, res, (err: unknown) => {
      if (!err) {
        if (!req.file)
          return next(new HttpError(400, "file_missing", 'Attach the data file in the form field "file".'));
        return next();
      }
      if (err instanceof multer.MulterError && err.code === "LIMIT_FILE_SIZE")
        return next(
          new HttpError(413, "payload_too_large", `The file is larger than the ${limitMb} MB upload limit.`),
        );
      // Other multer and busboy errors (no boundary, a truncated body, a malformed part header)
      // are mapped in the error handler; none is a server fault.
      next(toHttpError(err) ?? new HttpError(400, "bad_upload", "The upload could not be read."));
    });
  };
}

const MAX_NAME = 200;

/** A safe display name for an uploaded file: no folders, no control characters, at most 200 characters with its extension kept. */
export function safeFileName(original: string): string {
  const base = original.split(/[\\/]/).pop() ?? "upload";
  const clean = base
    // eslint-disable-next-line no-control-regex -- stripping control characters is the point
    .replace(/[\u0000-\u001f\u007f-\u009f]/g, "")
    .trim();
  if (clean === "" || clean === "." || clean === "..") return "upload";
  if (clean.length <= MAX_NAME) return clean;
  // Shorten the stem, not the extension: the extension decides how the file is read.
  const dot = clean.lastIndexOf(".");
  const ext = dot > 0 && clean.length - dot <= 10 ? clean.slice(dot) : "";
  return Array.from(clean.slice(0, clean.length - ext.length))
    .slice(0, MAX_NAME - ext.length - 1)
    .join("")
    .concat("…", ext);
}
