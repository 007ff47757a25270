export { renderCorrectionsPage, type CorrectionsPageInput } from './corrections-page.js';
export { embedCardStyleSource, renderEmbedCard, type EmbedCardInput } from './embed-card.js';
export {
  renderExplainerPage,
  type ExplainerPageInput,
  type ShareCard,
  type SubscriptionResult,
} from './explainer-page.js';
export { renderIndexPage, type IndexPageInput, type IndexQuery } from './index-page.js';
export { jsonLdText } from './json-ld.js';
export { renderMessagePage, type MessagePageInput } from './message-page.js';
export { renderMethodologyPage, type MethodologyPageInput } from './methodology-page.js';
export { readerStylesheet } from './reader-stylesheet.js';
