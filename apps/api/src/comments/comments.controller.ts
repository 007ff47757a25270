import { claimPartController } from '../claims/claim-part.controller';
import { commentKind } from './comment-kind';
import { CreateCommentDto } from './dto/create-comment.dto';
import { UpdateCommentDto } from './dto/update-comment.dto';

/** Notes on a claim by anyone on the desk: `claims/:id/comments`. */
export const CommentsController = claimPartController({
  path: 'comments',
  kind: commentKind,
  createDto: CreateCommentDto,
  updateDto: UpdateCommentDto,
});
