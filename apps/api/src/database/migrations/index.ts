import { Initial1796165154418 } from './1796165154418-Initial';
import { ClaimsDesk1796174782267 } from './1796174782267-ClaimsDesk';
import { QueueSortIndexes1796219054468 } from './1796219054468-QueueSortIndexes';
import { WorkingsAndDatasets1796219107240 } from './1796219107240-WorkingsAndDatasets';
import { Verdicts1796220519301 } from './1796220519301-Verdicts';
import { Publishing1796221845244 } from './1796221845244-Publishing';
import { QueueAndReaderIndexes1796227840239 } from './1796227840239-QueueAndReaderIndexes';
import { ClaimAsCleared1796299685686 } from './1796299685686-ClaimAsCleared';

/** Every migration in order, listed by class so the same list works from dist/ and under Jest. */
export const migrations = [
  Initial1796165154418,
  ClaimsDesk1796174782267,
  QueueSortIndexes1796219054468,
  WorkingsAndDatasets1796219107240,
  Verdicts1796220519301,
  Publishing1796221845244,
  QueueAndReaderIndexes1796227840239,
  ClaimAsCleared1796299685686,
];
