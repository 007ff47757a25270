import {
  citedSourceIds,
  cleanExplainerDocument,
  embeddedWorkingIds,
  type ExplainerDocument,
} from '@skyledger/explainer';
import { renderExplainerHtml } from '@skyledger/explainer/render';
import { In, type EntityManager } from 'typeorm';
import { ApiError } from '../common/errors/api-error';
import { ClaimSource } from '../sources/entities/claim-source.entity';
import { Working } from '../workings/entities/working.entity';

/**
 * An explainer body as it is stored: cleaned of anything outside the schema, checked to
 * cite only the claim's own sources and embed only its own workings, and rendered to
 * sanitized HTML.
 */
export async function prepareExplainerBody(
  manager: EntityManager,
  claimId: string,
  input: unknown,
): Promise<{ body: ExplainerDocument; bodyHtml: string }> {
  const body = cleanExplainerDocument(input);
  const sourceIds = citedSourceIds(body);
  if (sourceIds.length) {
    const linked = await manager.countBy(ClaimSource, { claimId, sourceId: In(sourceIds) });
    if (linked !== sourceIds.length) {
      throw ApiError.unprocessable(
        'The explainer cites a source that is not among the claim’s sources',
        {
          body: 'citesUnlinkedSource',
        },
      );
    }
  }
  const workingIds = embeddedWorkingIds(body);
  if (workingIds.length) {
    const own = await manager.countBy(Working, { claimId, id: In(workingIds) });
    if (own !== workingIds.length) {
      throw ApiError.unprocessable('The explainer embeds a working that is not on this claim', {
        body: 'embedsForeignWorking',
      });
    }
  }
  return { body, bodyHtml: renderExplainerHtml(body) };
}
