import { VisuallyHidden } from '@radix-ui/themes';
import { explainerExtensions, SourceCitation, WorkingEmbed } from '@skyledger/explainer';
import {
  NodeViewWrapper,
  ReactNodeViewRenderer,
  type Extensions,
  type ReactNodeViewProps,
} from '@tiptap/react';
import { WorkingSummary } from '../working-summary';
import { useExplainerEvidence } from './explainer-evidence';
import { useCitedSourceIds } from './use-cited-source-ids';

/** An embedded working, drawn as a card from the stored working the node names. */
function WorkingEmbedView({ node, selected }: ReactNodeViewProps) {
  const { workings, calculators } = useExplainerEvidence();
  return (
    <NodeViewWrapper
      as="figure"
      className="sl-working-card sl-working-embed"
      data-selected={selected ? '' : undefined}
      aria-label="Working"
    >
      <WorkingSummary
        workingId={String(node.attrs.workingId)}
        workings={workings}
        calculators={calculators}
      />
    </NodeViewWrapper>
  );
}

/** A citation as its number, [n], counted in order of first citation as the text changes. */
function SourceCitationView({ node, editor, selected }: ReactNodeViewProps) {
  const { sources } = useExplainerEvidence();
  const sourceId = String(node.attrs.sourceId);
  const number = useCitedSourceIds(editor).indexOf(sourceId) + 1;
  const source = sources.find((candidate) => candidate.id === sourceId);
  return (
    <NodeViewWrapper
      as="span"
      className="sl-citation"
      data-selected={selected ? '' : undefined}
      title={source?.title}
    >
      [{number}]<VisuallyHidden> {source?.title ?? 'a source'}</VisuallyHidden>
    </NodeViewWrapper>
  );
}

const DeskWorkingEmbed = WorkingEmbed.extend({
  addNodeView() {
    return ReactNodeViewRenderer(WorkingEmbedView);
  },
});

const DeskSourceCitation = SourceCitation.extend({
  addNodeView() {
    return ReactNodeViewRenderer(SourceCitationView, { as: 'span' });
  },
});

/** The explainer's shared schema, its own nodes drawn by the desk from the stored evidence. */
export function deskExplainerExtensions(): Extensions {
  return explainerExtensions().map((extension) =>
    extension.name === WorkingEmbed.name
      ? DeskWorkingEmbed
      : extension.name === SourceCitation.name
        ? DeskSourceCitation
        : extension,
  );
}
