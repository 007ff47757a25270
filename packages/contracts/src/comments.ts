import { z } from 'zod';
import { boundedText, versionSchema, type PersonRef } from './common.js';

export const COMMENT_MAX_LENGTH = 5000;

export const createCommentSchema = z.object({ body: boundedText(COMMENT_MAX_LENGTH) });
export type CreateCommentRequest = z.infer<typeof createCommentSchema>;

export const updateCommentSchema = createCommentSchema.extend({ version: versionSchema });
export type UpdateCommentRequest = z.infer<typeof updateCommentSchema>;

export interface CommentView {
  id: string;
  body: string;
  author: PersonRef;
  createdAt: string;
  editedAt: string | null;
  version: number;
}
