import { HttpStatus } from '@nestjs/common';
import { ApiError } from '../common/errors/api-error';

export const claimNotFound = () => new ApiError(HttpStatus.NOT_FOUND, 'No such claim');
