import { HttpStatus } from '@nestjs/common';
import { type Request } from 'express';
import { type StorageEngine } from 'multer';
import { ApiError } from '../common/errors/api-error';
import {
  discardStaged,
  stageStream,
  UploadTooLargeError,
  type StagedUpload,
} from './staged-upload';

/** The file multer hands the route: its staged copy, hash and size included. */
export type ReceivedFile = Express.Multer.File & StagedUpload;

function formatLimit(bytes: number): string {
  return bytes >= 1024 ** 2 ? `${+(bytes / 1024 ** 2).toFixed(1)} MB` : `${bytes} bytes`;
}

/**
 * A multer storage engine that stages each upload on disk while hashing it, so the bytes
 * are read once and a file over the limit is cut off as soon as it crosses it.
 */
export function stagingMulterStorage(options: {
  directory: string;
  maxBytes: number;
}): StorageEngine {
  return {
    _handleFile(_req: Request, file, callback) {
      stageStream(file.stream, { ...options, originalName: file.originalname }).then(
        (staged) => callback(null, staged),
        (error: unknown) =>
          callback(
            error instanceof UploadTooLargeError
              ? new ApiError(
                  HttpStatus.PAYLOAD_TOO_LARGE,
                  `The file is larger than the limit of ${formatLimit(error.limit)}`,
                  { file: 'tooLarge' },
                )
              : (error as Error),
          ),
      );
    },
    _removeFile(_req: Request, file, callback) {
      discardStaged(file as ReceivedFile).then(() => callback(null), callback);
    },
  };
}
