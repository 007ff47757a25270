import { z } from 'zod';
import { boundedText } from './common.js';

export const claimantKinds = ['public_figure', 'organisation', 'private_individual'] as const;
export type ClaimantKind = (typeof claimantKinds)[number];
export const claimantKindLabels: Record<ClaimantKind, string> = {
  public_figure: 'Public figure',
  organisation: 'Organisation',
  private_individual: 'Private individual',
};

export const CLAIMANT_NAME_MAX_LENGTH = 160;

export const createClaimantSchema = z.object({
  name: boundedText(CLAIMANT_NAME_MAX_LENGTH),
  kind: z.enum(claimantKinds, { error: 'Choose what kind of claimant this is' }),
  affiliation: boundedText(160, { required: false }).optional(),
  notes: boundedText(2000, { required: false }).optional(),
});
export type CreateClaimantRequest = z.infer<typeof createClaimantSchema>;

export const updateClaimantSchema = createClaimantSchema.partial().extend({
  /**
   * A private individual is never named on public pages unless a desk chief allows it;
   * only a desk chief may set this.
   */
  nameShownPublicly: z.boolean().optional(),
  version: z.number().int().min(1),
});
export type UpdateClaimantRequest = z.infer<typeof updateClaimantSchema>;

export interface ClaimantView {
  id: string;
  name: string;
  kind: ClaimantKind;
  affiliation: string | null;
  notes: string | null;
  /** Always true for public figures and organisations. */
  nameShownPublicly: boolean;
  version: number;
}
