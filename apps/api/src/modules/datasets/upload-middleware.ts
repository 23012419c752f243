import type { RequestHandler } from "express";
import multer from "multer";
import { HttpError } from "../../http/errors.js";

/** One file in memory, size-limited; multer's own errors become our error shape. */
export function singleFileUpload(limitMb: number): RequestHandler {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: limitMb * 1024 * 1024, files: 1, fields: 20 },
  }).single("file");
  return (req, res, next) => {
    upload(req, res, (err: unknown) => {
      if (!err) {
        if (!req.file)
          return next(new HttpError(400, "file_missing", 'Attach the data file in the form field "file".'));
        return next();
      }
      if (err instanceof multer.MulterError) {
        if (err.code === "LIMIT_FILE_SIZE")
          return next(
            new HttpError(
              413,
              "payload_too_large",
              `The file is larger than the ${limitMb} MB upload limit.`,
            ),
          );
        return next(new HttpError(400, "bad_upload", `The upload could not be read: ${err.message}.`));
      }
      next(err);
    });
  };
}

/** A safe display name for an uploaded file: no folders, no control characters. */
export function safeFileName(original: string): string {
  const base = original.split(/[\\/]/).pop() ?? "upload";
  const clean = base
    // eslint-disable-next-line no-control-regex -- stripping control characters is the point
    .replace(/[\u0000-\u001f\u007f]/g, "")
    .trim()
    .slice(0, 200);
  return clean === "" || clean === "." || clean === ".." ? "upload" : clean;
}
