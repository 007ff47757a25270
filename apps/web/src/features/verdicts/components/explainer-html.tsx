import { Card } from '@radix-ui/themes';
import { useMemo } from 'react';
import { TrustedHtml } from '@/components/ui/trusted-html';
import { WorkingSummary, type WorkingsOnHand } from './working-summary';

type Part = { kind: 'html'; html: string } | { kind: 'working'; workingId: string };

/**
 * The server's HTML cut at each embedded working, so each can be drawn from the stored
 * working between the HTML around it. Re-serializing sanitized markup keeps it as it was.
 */
function splitAtWorkings(html: string): Part[] {
  const body = new DOMParser().parseFromString(html, 'text/html').body;
  const parts: Part[] = [];
  const holder = document.createElement('div');
  const flush = () => {
    if (holder.innerHTML) parts.push({ kind: 'html', html: holder.innerHTML });
    holder.replaceChildren();
  };
  for (const node of [...body.childNodes]) {
    const workingId =
      node instanceof Element && node.matches('figure[data-working-id]')
        ? node.getAttribute('data-working-id')
        : null;
    if (workingId) {
      flush();
      parts.push({ kind: 'working', workingId });
    } else {
      holder.append(node);
    }
  }
  flush();
  return parts;
}

interface ExplainerHtmlProps extends WorkingsOnHand {
  /** `bodyHtml` of a verdict version: rendered and sanitized by the server. */
  html: string;
}

/** An explainer as readers will see it, its workings drawn from the stored ones. */
export function ExplainerHtml({ html, workings, calculators }: ExplainerHtmlProps) {
  const parts = useMemo(() => splitAtWorkings(html), [html]);
  return (
    <div className="sl-explainer">
      {parts.map((part, index) => {
        if (part.kind === 'html') return <TrustedHtml key={index} html={part.html} />;
        return (
          <Card key={index} asChild size="2" className="sl-working-card">
            <figure aria-label="Working">
              <WorkingSummary
                workingId={part.workingId}
                workings={workings}
                calculators={calculators}
              />
            </figure>
          </Card>
        );
      })}
    </div>
  );
}
