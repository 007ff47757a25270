import { type ClaimStatus, type Role } from '@skyledger/contracts';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { ApiError } from '../common/errors/api-error';
import { assertMayChangePart, assertMayEditClaim } from './claim-policy';
import { type Claim } from './entities/claim.entity';

const person = (role: Role, id = `${role}-id`): AuthenticatedUser => ({
  id,
  role,
  email: `${id}@policy.test`,
  displayName: id,
});
const claimOf = (status: ClaimStatus, filedById = 'reporter-id') =>
  ({ status, filedById }) as Claim;
const statusOf = (run: () => void): number | 'allowed' => {
  try {
    run();
    return 'allowed';
  } catch (error) {
    return (error as ApiError).getStatus();
  }
};

describe('who may edit a claim (PRODUCT.md, roles)', () => {
  it.each<[Role, ClaimStatus, string, number | 'allowed']>([
    ['reporter', 'filed', 'reporter-id', 'allowed'],
    ['reporter', 'filed', 'someone-else', 403],
    ['reporter', 'in_research', 'reporter-id', 403],
    ['science_editor', 'in_research', 'reporter-id', 'allowed'],
    ['science_editor', 'cleared', 'reporter-id', 'allowed'],
    ['desk_chief', 'sent_back', 'reporter-id', 'allowed'],
    ['copy_desk', 'filed', 'reporter-id', 403],
    ['desk_chief', 'published', 'reporter-id', 422],
    ['science_editor', 'set_aside', 'reporter-id', 422],
  ])('%s on a %s claim filed by %s: %s', (role, status, filedBy, expected) => {
    expect(statusOf(() => assertMayEditClaim(person(role), claimOf(status, filedBy)))).toBe(
      expected,
    );
  });
});

describe('who may change a record under a claim', () => {
  it.each<[Role, string, number | 'allowed']>([
    ['reporter', 'reporter-id', 'allowed'],
    ['reporter', 'someone-else', 403],
    ['copy_desk', 'someone-else', 403],
    ['science_editor', 'someone-else', 'allowed'],
    ['desk_chief', 'someone-else', 'allowed'],
  ])('%s changing a record added by %s: %s', (role, addedBy, expected) => {
    expect(
      statusOf(() => assertMayChangePart(person(role), { createdById: addedBy }, 'appearance')),
    ).toBe(expected);
  });
});
