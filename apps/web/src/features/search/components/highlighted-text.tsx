import type { Highlight } from '@skyledger/contracts';
import { Fragment } from 'react';

/** Text from the search with its matched words in <mark>; the runs are text, never HTML. */
export function HighlightedText({ runs }: { runs: Highlight }) {
  return (
    <>
      {runs.map((run, index) =>
        run.match ? (
          <mark key={index} className="sl-mark">
            {run.text}
          </mark>
        ) : (
          <Fragment key={index}>{run.text}</Fragment>
        ),
      )}
    </>
  );
}
