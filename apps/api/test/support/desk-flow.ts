import {
  type ClaimDetail,
  type ClaimStatus,
  type PublicationView,
  type VerdictVersionView,
} from '@skyledger/contracts';
import { testPassword, type TestApp } from './test-app';

export type Person = 'reporter' | 'editor' | 'copy' | 'chief';
const roles = {
  reporter: 'reporter',
  editor: 'science_editor',
  copy: 'copy_desk',
  chief: 'desk_chief',
} as const;

/**
 * The desk's steps as its people take them through the API, for suites that need a
 * claim further along its life: researched, cleared, published.
 */
export class DeskFlow {
  readonly tokens = {} as Record<Person, string>;
  readonly ids = {} as Record<Person, string>;

  private constructor(private readonly t: TestApp) {}

  /** One person per role, signed in, with e-mails at `domain`. */
  static async start(t: TestApp, domain: string): Promise<DeskFlow> {
    const flow = new DeskFlow(t);
    for (const [person, role] of Object.entries(roles) as Array<[Person, (typeof roles)[Person]]>) {
      const user = await t.addUser(role, `${person}@${domain}`);
      flow.ids[person] = user.id;
      flow.tokens[person] = (await t.signIn(user.email, testPassword)).accessToken;
    }
    return flow;
  }

  as(person: Person) {
    return { Authorization: `Bearer ${this.tokens[person]}` };
  }

  async detail(claimId: string): Promise<ClaimDetail> {
    return (await this.t.http().get(`/api/claims/${claimId}`).set(this.as('copy')).expect(200))
      .body as ClaimDetail;
  }

  async move(claimId: string, who: Person, to: ClaimStatus, note?: string): Promise<void> {
    const response = await this.t
      .http()
      .post(`/api/claims/${claimId}/transitions`)
      .set(this.as(who))
      .send({ to, note, version: (await this.detail(claimId)).version });
    if (response.status !== 200) {
      throw new Error(
        `moving to ${to} failed: ${response.status} ${JSON.stringify(response.body)}`,
      );
    }
  }

  async publish(claimId: string, who: Person, body: object = {}) {
    return this.t
      .http()
      .post(`/api/claims/${claimId}/publish`)
      .set(this.as(who))
      .send({ version: (await this.detail(claimId)).version, ...body });
  }

  /** Publishes now and answers the explainer's slug. */
  async publishNow(claimId: string, body: object = {}): Promise<string> {
    const response = await this.publish(claimId, 'copy', body);
    if (response.status !== 201)
      throw new Error(`publishing failed: ${JSON.stringify(response.body)}`);
    const [latest] = response.body as PublicationView[];
    return /\/explainers\/([^/]+)\//.exec(latest!.url)![1]!;
  }

  /** Drafts (or revises) the verdict and takes it through sign-off to cleared. */
  async clearVerdict(claimId: string, fields: object): Promise<void> {
    const draft = (
      await this.t
        .http()
        .post(`/api/claims/${claimId}/verdict/versions`)
        .set(this.as('editor'))
        .send({})
    ).body as VerdictVersionView;
    await this.t
      .http()
      .patch(`/api/claims/${claimId}/verdict/versions/${draft.id}`)
      .set(this.as('editor'))
      .send({ version: draft.version, ...fields })
      .expect(200);
    await this.move(claimId, 'editor', 'awaiting_signoff');
    await this.move(claimId, 'copy', 'cleared');
  }

  /**
   * A claim filed with a first appearance, researched by the editor (a strong source, a
   * reply attempt, a working embedded in the explainer) and cleared.
   */
  async clearedClaim(
    summary: string,
    claimant: { name: string; kind: string } = {
      name: `Claimant of ${summary}`,
      kind: 'public_figure',
    },
    appearance: object = {},
  ): Promise<ClaimDetail> {
    const http = () => this.t.http();
    const filed = await http()
      .post('/api/claims')
      .set(this.as('reporter'))
      .send({
        text: `${summary}, said on the Marrowby phone-in.`,
        summary,
        topics: ['geothermal'],
        claimant,
        firstAppearance: {
          url: 'https://radio.marrowby.test/phone-in/2026-11-20',
          outlet: 'Radio Marrowby phone-in',
          seenAt: '2026-11-20T18:30:00+00:00',
          seenTimeZone: 'Europe/London',
          isFirstKnown: true,
          ...appearance,
        },
      })
      .expect(201);
    const claim = filed.body as ClaimDetail;
    await http()
      .post(`/api/claims/${claim.id}/assign`)
      .set(this.as('editor'))
      .send({ assigneeId: this.ids.editor, version: claim.version })
      .expect(200);
    const source = await http()
      .post(`/api/claims/${claim.id}/sources`)
      .set(this.as('editor'))
      .send({
        source: {
          title: 'Heat flow from the Earth’s interior: analysis of the global data set',
          authors: 'Pollack, H. N.; Hurter, S. J.; Johnson, J. R.',
          publisher: 'Reviews of Geophysics',
          year: 1993,
          doi: '10.1029/93RG01249',
          kind: 'peer_reviewed_paper',
          grade: 'strong',
          gradeReason: 'The standard compilation of heat-flow measurements',
        },
      })
      .expect(201);
    await http()
      .post(`/api/claims/${claim.id}/reply-attempts`)
      .set(this.as('editor'))
      .send({
        contacted: 'The caller, through the station',
        contactedAt: '2026-11-21T10:00:00+00:00',
        channel: 'phone',
        outcome: 'no_reply',
      })
      .expect(201);
    const working = await http()
      .post(`/api/claims/${claim.id}/workings`)
      .set(this.as('editor'))
      .send({ calculatorId: 'heat-flux-compare', inputs: {} })
      .expect(201);
    await this.clearVerdict(claim.id, {
      ratingId: 'contradicted',
      bottomLine:
        'Heat from the Earth’s interior is about thirty times smaller than the greenhouse forcing.',
      primarySourceId: source.body.id,
      body: {
        type: 'doc',
        content: [
          {
            type: 'paragraph',
            content: [
              { type: 'text', text: 'The interior gives off about 47 TW.' },
              { type: 'sourceCitation', attrs: { sourceId: source.body.id } },
            ],
          },
          { type: 'workingEmbed', attrs: { workingId: working.body.id } },
        ],
      },
    });
    return this.detail(claim.id);
  }
}
