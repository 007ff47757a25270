export { explainerExtensions, linkProtocols } from './extensions.js';
export { SourceCitation, WorkingEmbed } from './nodes.js';
export {
  citedSourceIds,
  cleanExplainerDocument,
  embeddedWorkingIds,
  explainerPlainText,
  isAllowedHref,
  isEmptyExplainer,
  type ExplainerDocument,
} from './document.js';
export { explainerTemplate } from './template.js';
export { likelihoodPhrase, likelihoodTerms, type LikelihoodTerm } from './likelihood.js';
