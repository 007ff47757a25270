import { HttpStatus } from '@nestjs/common';
import { ApiError } from '../errors/api-error';

/**
 * For bodies that name an existing record by id or describe a new one: exactly one of
 * the two must be given. Refused as 400 on the id field, e.g. `{ claimantId: 'oneOfClaimantIdOrClaimant' }`.
 */
export function assertExactlyOne<T extends object>(
  body: T,
  idField: keyof T & string,
  newField: keyof T & string,
  message: string,
): void {
  if (Boolean(body[idField]) !== Boolean(body[newField])) return;
  const rule = `oneOf${idField[0]!.toUpperCase()}${idField.slice(1)}Or${newField[0]!.toUpperCase()}${newField.slice(1)}`;
  throw new ApiError(HttpStatus.BAD_REQUEST, message, { [idField]: rule });
}
