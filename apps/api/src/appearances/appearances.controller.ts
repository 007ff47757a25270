import { claimPartController } from '../claims/claim-part.controller';
import { appearanceKind } from './appearance-kind';
import { CreateAppearanceDto } from './dto/create-appearance.dto';
import { UpdateAppearanceDto } from './dto/update-appearance.dto';

/** Where and when a claim was seen: `claims/:id/appearances`. */
export const AppearancesController = claimPartController({
  path: 'appearances',
  kind: appearanceKind,
  createDto: CreateAppearanceDto,
  updateDto: UpdateAppearanceDto,
  toValues: ({ seenAt, ...fields }) => ({
    ...fields,
    ...(seenAt ? { seenAt: new Date(seenAt) } : {}),
  }),
});
