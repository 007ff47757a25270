export { renderExplainerHtml, sanitizeExplainerHtml } from './render-explainer.js';
