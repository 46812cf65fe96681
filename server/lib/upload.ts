/**
 * Every file upload goes through singleUpload: one file in memory, with multer's limit errors
 * answered in brewers' words (413 for size, 400 for the wrong field or too many files) under the
 * form field, instead of multer's own text.
 */
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import multer from 'multer';
import { BadRequest, HttpError } from './errors';

export class PayloadTooLarge extends HttpError {
  constructor(message: string, fields?: Record<string, string>) {
    super(413, 'too_large', message, fields);
  }
}

export interface UploadSpec {
  /** The multipart field the file comes in. */
  field: string;
  /** What the brewer is sending, for messages: "photo", "CSV file". */
  what: string;
  maxBytes: number;
  /** What to do when the file is too big. */
  tooLargeTip: string;
  /** Size of the text fields sent beside the file. */
  fieldSize?: number;
}

export function singleUpload(spec: UploadSpec): RequestHandler {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: spec.maxBytes, files: 1, fields: 5, ...(spec.fieldSize && { fieldSize: spec.fieldSize }) },
  }).single(spec.field);
  const mb = spec.maxBytes / (1024 * 1024);
  return (req: Request, res: Response, next: NextFunction) => {
    res.locals.acceptsUpload = true;
    upload(req, res, (error: unknown) => {
      if (!error) return next();
      if (error instanceof multer.MulterError) {
        if (error.code === 'LIMIT_FILE_SIZE') {
          const message = `The ${spec.what} is larger than ${mb} MB. ${spec.tooLargeTip}`;
          return next(new PayloadTooLarge(message, { [spec.field]: message }));
        }
        if (error.code === 'LIMIT_FIELD_VALUE') {
          const message = 'A form field sent with the file is too long.';
          return next(new BadRequest(message, { [error.field ?? spec.field]: message }));
        }
        const message = `Send one ${spec.what}, in the form field named "${spec.field}".`;
        return next(new BadRequest(message, { [spec.field]: message }));
      }
      next(error);
    });
  };
}
