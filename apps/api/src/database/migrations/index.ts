import { Initial1796165154418 } from './1796165154418-Initial';

/** Every migration in order, listed by class so the same list works from dist/ and under Jest. */
export const migrations = [Initial1796165154418];
