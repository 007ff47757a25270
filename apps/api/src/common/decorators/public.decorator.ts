import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC_KEY = 'isPublic';

/** Opens a route to callers without a sign-in; every other route needs one. */
export const Public = () => SetMetadata(IS_PUBLIC_KEY, true);
