import { HttpStatus, Param, ParseUUIDPipe } from '@nestjs/common';
import { ApiError } from '../errors/api-error';

/** A route id that must be a UUID; anything else is a 400 naming the parameter. */
export const UuidParam = (name = 'id') =>
  Param(
    name,
    new ParseUUIDPipe({
      exceptionFactory: () =>
        new ApiError(HttpStatus.BAD_REQUEST, `${name} must be a UUID`, { [name]: 'isUuid' }),
    }),
  );
