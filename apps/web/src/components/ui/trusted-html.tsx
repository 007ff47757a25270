import type { Ref } from 'react';

interface TrustedHtmlProps {
  /**
   * HTML the desk server rendered and cleaned with its allow-list (packages/explainer,
   * `renderExplainerHtml`): never text typed in the browser, nor anything from elsewhere.
   */
  html: string;
  className?: string;
  ref?: Ref<HTMLDivElement>;
}

/**
 * The one place the desk puts markup from the server into the page, so the trust it takes
 * is taken in one place only and is easy to review.
 */
export function TrustedHtml({ html, className, ref }: TrustedHtmlProps) {
  return <div ref={ref} className={className} dangerouslySetInnerHTML={{ __html: html }} />;
}
