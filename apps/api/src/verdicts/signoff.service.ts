import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type SignoffView } from '@skyledger/contracts';
import { DataSource, In } from 'typeorm';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { ClaimsService } from '../claims/claims.service';
import { VerdictVersion } from './entities/verdict-version.entity';
import { signoffChecklist } from './signoff-checklist';
import { twoPersonRuleRefusal } from './two-person-rule';
import { VerdictsService } from './verdicts.service';

/** What the sign-off page shows: the version to decide on, the one before, the checklist. */
@Injectable()
export class SignoffService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly claims: ClaimsService,
    private readonly verdicts: VerdictsService,
  ) {}

  async view(actor: AuthenticatedUser, claimId: string): Promise<SignoffView> {
    const claim = await this.claims.findOrFail(claimId);
    const manager = this.dataSource.manager;
    const submitted = await manager.findOne(VerdictVersion, {
      where: { claimId, state: 'submitted' },
    });
    const previous = await manager.findOne(VerdictVersion, {
      where: {
        claimId,
        state: In(['sent_back', 'cleared', 'published', 'superseded']),
      },
      order: { number: 'DESC' },
    });
    const checklist = await signoffChecklist(manager, claim, submitted);
    const whyNot = !submitted
      ? 'No version is waiting for sign-off'
      : !['copy_desk', 'desk_chief'].includes(actor.role)
        ? 'Only the copy desk or a desk chief signs off'
        : twoPersonRuleRefusal(actor, submitted);
    return {
      version: submitted ? await this.verdicts.versionView(submitted.id) : null,
      previous:
        previous && (!submitted || previous.number < submitted.number)
          ? await this.verdicts.versionView(previous.id)
          : null,
      checklist,
      mayDecide: whyNot === null,
      whyNot,
    };
  }
}
