import { applyDecorators, HttpStatus, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBody, ApiConsumes } from '@nestjs/swagger';
import { ApiError } from '../common/errors/api-error';
import { type ReceivedFile } from './staging-multer-storage';

/**
 * A route that takes one file in the multipart field `file`, staged and hashed by the
 * module's multer engine. Put `@Roles` on the route too: guards run before any byte is read.
 */
export const FileUpload = () =>
  applyDecorators(
    UseInterceptors(FileInterceptor('file')),
    ApiConsumes('multipart/form-data'),
    ApiBody({
      schema: {
        type: 'object',
        required: ['file'],
        properties: { file: { type: 'string', format: 'binary' } },
      },
    }),
  );

/** The received file, or a 400 naming the `file` field. */
export function requireFile(file: ReceivedFile | undefined, what = 'a file'): ReceivedFile {
  if (!file) {
    throw new ApiError(HttpStatus.BAD_REQUEST, `Attach ${what} in the field "file"`, {
      file: 'required',
    });
  }
  return file;
}
