import { type AppearanceView } from '@skyledger/contracts';
import { toPersonRef } from '../common/views/person-ref';
import { type Appearance } from './entities/appearance.entity';

/** Needs `createdBy` loaded. */
export function toAppearanceView(appearance: Appearance): AppearanceView {
  return {
    id: appearance.id,
    url: appearance.url,
    outlet: appearance.outlet,
    seenAt: appearance.seenAt.toISOString(),
    seenTimeZone: appearance.seenTimeZone,
    isFirstKnown: appearance.isFirstKnown,
    captureAttachmentId: appearance.captureAttachmentId,
    addedBy: toPersonRef(appearance.createdBy),
    createdAt: appearance.createdAt.toISOString(),
    version: appearance.version,
  };
}
