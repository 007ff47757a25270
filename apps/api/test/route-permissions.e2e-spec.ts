import { roles, type Role } from '@skyledger/contracts';
import { createTestApp, testPassword, type TestApp } from './support/test-app';

type Caller = 'anonymous' | Role;
const callers: Caller[] = ['anonymous', ...roles];
const signedIn: readonly Role[] = roles;

/**
 * Who may pass each route's doors (authentication and role guards), route by route: the
 * expected table. Checks that depend on the record (who filed a claim, who drafted a
 * verdict) are the feature suites' to test; this one makes sure no route is open by
 * mistake, and that a new route cannot be added without saying who may call it.
 */
const open = 'open' as const;
const expected: Record<string, typeof open | readonly Role[]> = {
  // Signing in and the links in mails: open by nature.
  'GET /api/health': open,
  // The benchmark's constant reference answer; registered outside production only.
  'GET /api/bench/ping': open,
  'POST /api/auth/sign-in': open,
  // Open, but it answers only to the refresh cookie: a bearer token does not count.
  'POST /api/auth/refresh': [],
  'POST /api/auth/sign-out': open,
  'POST /api/auth/password-reset/request': open,
  'POST /api/auth/password-reset': open,
  'GET /api/auth/invitations/:token': open,
  'POST /api/auth/invitations/accept': open,
  // The calculators are published for outside checks; they read no desk data.
  'GET /api/calculators': open,
  'POST /api/calculators/:calculatorId/run': open,
  // The reader side.
  'GET /explainers': open,
  'GET /explainers/:slug': open,
  'GET /explainers/:slug/v/:sequence': open,
  'POST /explainers/:slug/subscribe': open,
  'GET /explainers/:slug/subscription/confirm': open,
  'GET /explainers/:slug/subscription/unsubscribe': open,
  'POST /explainers/:slug/subscription/unsubscribe': open,
  'GET /explainers/:slug/card': open,
  'GET /explainers/:slug/captures/:attachmentId': open,
  'GET /corrections': open,
  'GET /methodology': open,
  'GET /feeds/explainers.atom': open,
  'GET /oembed': open,

  // The desk chief's pages.
  'GET /api/users': ['desk_chief'],
  'POST /api/users/invitations': ['desk_chief'],
  'POST /api/users/:id/invitation': ['desk_chief'],
  'PATCH /api/users/:id': ['desk_chief'],
  'GET /api/outbox': ['desk_chief'],
  'POST /api/outbox/:id/retry': ['desk_chief'],
  'GET /api/audit': ['desk_chief'],
  'GET /api/audit/export': ['desk_chief'],
  'POST /api/rating-levels': ['desk_chief'],
  'PATCH /api/rating-levels/:levelId': ['desk_chief'],
  'DELETE /api/rating-levels/:levelId': ['desk_chief'],
  'PUT /api/claims/:id/reply-waiver': ['desk_chief'],
  'POST /api/search/reindex': ['desk_chief'],
  // Filing and the claimant and source records.
  'POST /api/claims': ['reporter', 'science_editor', 'desk_chief'],
  'POST /api/claimants': ['reporter', 'science_editor', 'desk_chief'],
  'PATCH /api/claimants/:id': ['science_editor', 'desk_chief'],
  'PATCH /api/sources/:id': ['reporter', 'science_editor', 'desk_chief'],
  // Research.
  'POST /api/datasets/uploads': ['science_editor', 'desk_chief'],
  'POST /api/datasets': ['science_editor', 'desk_chief'],
  // Evidence files: whoever may add to a claim.
  'POST /api/claims/:id/attachments': ['reporter', 'science_editor', 'desk_chief'],
  // Publishing: the copy desk and the desk chief.
  'POST /api/claims/:id/publish': ['copy_desk', 'desk_chief'],
  'DELETE /api/claims/:id/publication-schedule': ['copy_desk', 'desk_chief'],
};

/**
 * Every other route: any signed-in role passes the doors; the record decides the rest.
 * The OpenAPI pages (the API's shape, no data) are open.
 */
const expectationOf = (route: string) =>
  expected[route] ??
  (route.startsWith('GET /api/docs') || route.startsWith('GET /reader/') ? open : signedIn);

interface RouteLayer {
  route?: { path: string; methods: Record<string, boolean> };
}

describe('every route against every role', () => {
  let t: TestApp;
  const tokens: Partial<Record<Role, string>> = {};
  const routes: string[] = [];

  beforeAll(async () => {
    t = await createTestApp('route_permissions', {
      OUTBOX_WORKER_ENABLED: 'false',
      PUBLISHER_ENABLED: 'false',
    });
    for (const role of roles) {
      const user = await t.addUser(role, `${role.replace('_', '-')}@routes.test`);
      tokens[role] = (await t.signIn(user.email, testPassword)).accessToken;
    }
    // The routes as Express registered them, so a new one cannot be missed.
    const stack = (t.app.getHttpAdapter().getInstance() as { router: { stack: RouteLayer[] } })
      .router.stack;
    for (const layer of stack) {
      // Routes for every method at once are Nest's 404 answers to unmatched requests.
      if (!layer.route || Object.keys(layer.route.methods).length > 8) continue;
      for (const method of Object.keys(layer.route.methods)) {
        routes.push(
          `${method.toUpperCase()} ${layer.route.path.replace(/\{\*[^}]+\}|\*\w+/g, '*')}`,
        );
      }
    }
  });
  afterAll(() => t.close());

  it('finds the routes, and every route in the table still exists', () => {
    expect(routes.length).toBeGreaterThan(60);
    const gone = Object.keys(expected).filter((route) => !routes.includes(route));
    expect(gone).toEqual([]);
  });

  it('lets in exactly who the table says, route by route and role by role', async () => {
    const id = '3f1c6f0e-8a4b-4c4e-9d7e-2b1a0c9d8e7f';
    const surprises: string[] = [];
    let calls = 0;
    for (const route of routes) {
      const [method, pattern] = route.split(' ') as [string, string];
      const path = pattern
        .replace(/:(\w+)/g, (_all, name: string) =>
          name === 'slug'
            ? 'no-such-explainer'
            : name === 'sequence'
              ? '1'
              : name === 'levelId'
                ? 'no-such-level'
                : name === 'calculatorId'
                  ? 'energy-balance'
                  : name === 'token'
                    ? 'no-such-token'
                    : id,
        )
        .replace('*', 'no-such-file.css');
      const allowed = expectationOf(route);
      for (const caller of callers) {
        let request = t.http()[method.toLowerCase() as 'get'](path);
        if (caller !== 'anonymous')
          request = request.set('Authorization', `Bearer ${tokens[caller]}`);
        let status: number;
        try {
          status = (method === 'GET' ? await request : await request.send({})).status;
        } catch (error) {
          surprises.push(`${route} as ${caller}: ${String(error)}`);
          continue;
        }
        calls += 1;
        const passed = status !== 401 && status !== 403;
        const shouldPass = allowed === open || (caller !== 'anonymous' && allowed.includes(caller));
        if (passed !== shouldPass) {
          surprises.push(
            `${route} as ${caller}: ${status}, expected ${shouldPass ? 'to pass' : 'to be refused'}`,
          );
        }
        if (status >= 500) surprises.push(`${route} as ${caller}: ${status}`);
      }
    }
    console.info(
      `Route × role matrix: ${routes.length} routes × ${callers.length} callers = ${calls} calls`,
    );
    expect(surprises).toEqual([]);
  });
});
