import { Code, Flex, Text } from '@radix-ui/themes';
import type { AuditEventView, AuditQuery } from '@skyledger/contracts';
import { useNavigation, useSearchParams } from 'react-router-dom';
import { AppLink } from '@/components/ui/app-link';
import { DateTime } from '@/components/ui/date-time';
import { DownloadButton } from '@/components/ui/download-button';
import { PagePager } from '@/components/ui/page-pager';
import { ScrollTable } from '@/components/ui/scroll-table';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { describeDetails } from '@/features/claims/components/claim/history/history-words';
import { auditSearchParams, parseAuditSearch } from '../api/audit-search';
import { useExportAudit } from '../api/export-audit';
import { useAuditEvents } from '../api/get-audit-events';
import { AuditFilters } from './audit-filters';
import { describeAuditAction } from './audit-words';

function WhatHappened({ event }: { event: AuditEventView }) {
  return (
    <Flex direction="column" gap="1" className="sl-audit-what">
      <Text>
        <Text weight="bold">{event.actor?.displayName ?? 'The desk'}</Text>{' '}
        {describeAuditAction(event)}
      </Text>
      {describeDetails(event).map((line) => (
        <Text key={line} size="1" color="gray" className="sl-break">
          {line}
        </Text>
      ))}
    </Flex>
  );
}

function ExportButton({ query }: { query: AuditQuery }) {
  const exportCsv = useExportAudit();
  return (
    <DownloadButton
      label="Export CSV"
      pending={exportCsv.isPending}
      error={exportCsv.error}
      onClick={() => exportCsv.mutate(query)}
    />
  );
}

const columns = ['When', 'What happened', 'Action', 'Record', 'Claim'];

/** The append-only audit trail for the desk chief: filtered in the URL, paged, exportable. */
export function AuditTrail() {
  const [searchParams, setSearchParams] = useSearchParams();
  const query = parseAuditSearch(searchParams);
  const { data } = useAuditEvents(query);
  const navigation = useNavigation();
  const busy =
    navigation.state === 'loading' && navigation.location.pathname === paths.app.audit.path;
  const filtersKey = auditSearchParams({ ...query, page: undefined }).toString();

  const rows = data.items.map((event) => [
    <DateTime value={event.at} />,
    <WhatHappened event={event} />,
    <Code size="1" variant="ghost">
      {event.action}
    </Code>,
    <Text size="1" className="sl-break">
      {event.entityType.replaceAll('_', ' ')}{' '}
      <Code size="1" variant="ghost">
        {event.entityId}
      </Code>
    </Text>,
    event.claimId ? (
      <AppLink to={paths.app.claim.getHref(event.claimId)} size="2">
        Open the claim
      </AppLink>
    ) : (
      '—'
    ),
  ]);

  return (
    <Flex direction="column" gap="5">
      <PageHeader
        title="Audit trail"
        purpose="Everything done on the desk, newest first, so you can always show who did what and when. Nothing here can be changed; the export holds every event under the filters, oldest first."
        action={<ExportButton query={query} />}
      />
      <AuditFilters
        key={filtersKey}
        query={query}
        onApply={(filters) => setSearchParams(auditSearchParams(filters))}
      />
      <Flex direction="column" gap="3" aria-busy={busy} className={busy ? 'sl-busy' : undefined}>
        {data.total === 0 ? (
          <Text>No events match these filters.</Text>
        ) : (
          <ScrollTable caption="Audit events, newest first" columns={columns} rows={rows} full />
        )}
        <PagePager
          label="Pages of the audit trail"
          noun="Events"
          page={data.page}
          pageSize={data.pageSize}
          total={data.total}
          onPage={(page) => setSearchParams(auditSearchParams({ ...query, page }))}
        />
      </Flex>
    </Flex>
  );
}
