import type { AuditQuery } from '@skyledger/contracts';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { saveBlob } from '@/lib/save-blob';
import { auditFilterParams } from './audit-search';

/** Every event under the filters as CSV, fetched with the token (a plain link could not send it). */
export function exportAudit(query: AuditQuery): Promise<Blob> {
  return api.blob('/audit/export', { params: auditFilterParams(query) });
}

export function useExportAudit() {
  return useMutation({
    mutationFn: exportAudit,
    onSuccess: (csv) => saveBlob(csv, 'skyledger-audit.csv'),
  });
}
