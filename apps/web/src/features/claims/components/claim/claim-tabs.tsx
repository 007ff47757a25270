import { Box, Tabs } from '@radix-ui/themes';
import type { ClaimDetail, CurrentUser } from '@skyledger/contracts';
import { useLocation, useNavigate } from 'react-router-dom';
import type { ShowNotice } from '@/components/ui/toaster';
import { PublishingSection } from '@/features/publishing/components/publishing-section';
import { AppearancesSection } from './appearances/appearances-section';
import { CommentsSection } from './comments/comments-section';
import { ExpertsSection } from './experts/experts-section';
import { FilesSection } from './files/files-section';
import { HistorySection } from './history/history-section';
import { ReplySection } from './reply/reply-section';
import { SourcesSection } from './sources/sources-section';
import { SummarySection } from './summary/summary-section';
import { WorkingsSection } from './workings/workings-section';

export interface SectionProps {
  claim: ClaimDetail;
  user: CurrentUser;
  onNotice: ShowNotice;
}

const sections = [
  { id: 'summary', label: () => 'Summary', Section: SummarySection },
  {
    id: 'appearances',
    label: (c: ClaimDetail) => `Appearances (${c.appearances.length})`,
    Section: AppearancesSection,
  },
  {
    id: 'sources',
    label: (c: ClaimDetail) => `Sources (${c.sources.length})`,
    Section: SourcesSection,
  },
  {
    id: 'files',
    label: (c: ClaimDetail) => `Evidence files (${c.attachments.length})`,
    Section: FilesSection,
  },
  { id: 'workings', label: () => 'Workings', Section: WorkingsSection },
  {
    id: 'reply',
    label: (c: ClaimDetail) => `Right of reply (${c.replyAttempts.length})`,
    Section: ReplySection,
  },
  {
    id: 'experts',
    label: (c: ClaimDetail) => `Experts (${c.consultations.length})`,
    Section: ExpertsSection,
  },
  {
    id: 'comments',
    label: (c: ClaimDetail) => `Comments (${c.comments.length})`,
    Section: CommentsSection,
  },
  { id: 'publishing', label: () => 'Publishing', Section: PublishingSection },
  { id: 'history', label: () => 'History', Section: HistorySection },
] as const;

type SectionId = (typeof sections)[number]['id'];

function isSection(id: string): id is SectionId {
  return sections.some((section) => section.id === id);
}

/** The claim's parts, one tab each; the open tab is the URL's hash, so it can be linked to. */
export function ClaimTabs(props: SectionProps) {
  const { hash } = useLocation();
  const navigate = useNavigate();
  const wanted = hash.slice(1);
  const value: SectionId = isSection(wanted) ? wanted : 'summary';
  return (
    <Tabs.Root
      value={value}
      onValueChange={(next) =>
        navigate(
          { hash: next === 'summary' ? '' : next },
          { replace: true, preventScrollReset: true },
        )
      }
    >
      <Tabs.List aria-label="Parts of the claim" className="sl-scroll-x">
        {sections.map(({ id, label }) => (
          <Tabs.Trigger key={id} value={id}>
            {label(props.claim)}
          </Tabs.Trigger>
        ))}
      </Tabs.List>
      <Box pt="5">
        {sections.map(({ id, Section }) => (
          <Tabs.Content key={id} value={id}>
            <Section {...props} />
          </Tabs.Content>
        ))}
      </Box>
    </Tabs.Root>
  );
}
