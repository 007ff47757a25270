import { type AppearanceView } from '@skyledger/contracts';
import { Not } from 'typeorm';
import { Attachment } from '../attachments/entities/attachment.entity';
import { claimRoles } from '../claims/claim-policy';
import { type ClaimPartKind } from '../claims/claim-part-kind';
import { ApiError } from '../common/errors/api-error';
import { toAppearanceView } from './appearance-view';
import { Appearance } from './entities/appearance.entity';

export const appearanceKind: ClaimPartKind<Appearance, AppearanceView> = {
  entity: Appearance,
  name: 'appearance',
  addRoles: claimRoles.contribute,
  toView: toAppearanceView,
  summarise: (appearance) => ({
    url: appearance.url,
    outlet: appearance.outlet,
    isFirstKnown: appearance.isFirstKnown,
  }),
  async beforeSave(manager, claim, appearance) {
    if (appearance.captureAttachmentId) {
      const capture = await manager.existsBy(Attachment, {
        id: appearance.captureAttachmentId,
        claimId: claim.id,
      });
      if (!capture) {
        throw ApiError.unprocessable('The capture must be a file uploaded to this claim', {
          captureAttachmentId: 'notOnClaim',
        });
      }
    }
    if (appearance.isFirstKnown) {
      // Only one appearance is the first known one: the newly marked one takes over.
      await manager
        .createQueryBuilder()
        .update(Appearance)
        .set({ isFirstKnown: false, version: () => 'version + 1' })
        .where({
          claimId: claim.id,
          isFirstKnown: true,
          ...(appearance.id ? { id: Not(appearance.id) } : {}),
        })
        .execute();
    }
  },
};
