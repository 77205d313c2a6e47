import { Box, Link, Paper, TextField, Typography } from '@mui/material';
import { useEffect, useState } from 'react';
import { Link as RouterLink } from 'react-router';
import { CsvDownloadButton } from '@/components/data-table/csv-download-button';
import { createDataTableColumnHelper, DataTable } from '@/components/data-table/data-table';
import { FilterBar, FilterSelect } from '@/components/data-table/filter-bar';
import { useListParams } from '@/components/data-table/use-list-params';
import { paths } from '@/config/paths';
import { useAuditEvents, useAuditFacets } from '@/features/audit/api/get-audit-events';
import type { TimelineEvent } from '@/features/audit/types';
import { useDebouncedValue } from '@/lib/use-debounced-value';

export const AUDIT_FILTERS = ['entityType', 'entityId', 'action', 'actorId', 'from', 'to'] as const;

const dateTime = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'medium' });
const helper = createDataTableColumnHelper<TimelineEvent>();

const recordText = (e: TimelineEvent) =>
  `${e.entityType}${e.entityId !== null ? ` ${e.entityId}` : ''}`;

const columns = helper.columns([
  helper.accessor('at', {
    header: 'When',
    enableSorting: true,
    cell: (info) => (
      <Typography variant="body2" sx={{ whiteSpace: 'nowrap' }}>
        {dateTime.format(new Date(info.getValue()))}
      </Typography>
    ),
  }),
  helper.accessor((e) => e.actor?.name ?? 'The system', {
    id: 'person',
    header: 'Person',
    cell: (info) => (
      <Typography variant="body2" title={info.row.original.actorEmail}>
        {info.getValue()}
      </Typography>
    ),
  }),
  helper.accessor('action', {
    header: 'Action',
    enableSorting: true,
    cell: (info) => (
      <Typography variant="body2" sx={{ fontFamily: 'monospace', whiteSpace: 'nowrap' }}>
        {info.getValue()}
      </Typography>
    ),
  }),
  helper.accessor(recordText, {
    id: 'entityType',
    header: 'Record',
    enableSorting: true,
    cell: (info) => {
      const e = info.row.original;
      return (
        <Typography variant="body2" sx={{ whiteSpace: 'nowrap' }}>
          {info.getValue()}
          {e.lotId && !(e.entityType === 'lot' && e.entityId === e.lotId) ? (
            <>
              {' · '}
              <Link component={RouterLink} to={paths.lot.getHref(e.lotId)}>
                lot {e.lotId}
              </Link>
            </>
          ) : null}
        </Typography>
      );
    },
  }),
  helper.accessor('summary', {
    header: 'What happened',
    cell: (info) => (
      <Typography variant="body2" sx={{ minWidth: 240 }}>
        {info.getValue()}
      </Typography>
    ),
  }),
]);

/** A text filter sent once typing pauses. */
function useTypedFilter(value: string, set: (v: string) => void) {
  const [text, setText] = useState(value);
  const debounced = useDebouncedValue(text, 400);
  useEffect(() => {
    if (debounced.trim() !== value) set(debounced.trim());
  }, [debounced, value, set]);
  useEffect(() => setText(value), [value]);
  return [text, setText] as const;
}

/** The admin's view of the audit trail: every event, filtered, and the same as CSV. */
export function AuditPanel() {
  const list = useListParams({
    filters: AUDIT_FILTERS,
    defaultSort: { field: 'at', direction: 'desc' },
    defaultPageSize: 25,
  });
  const events = useAuditEvents(list.query);
  const facets = useAuditFacets();
  const { setFilter } = list;
  const [recordId, setRecordId] = useTypedFilter(list.filters.entityId, (v) =>
    setFilter('entityId', v),
  );
  const idProblem = recordId.trim() && !/^[1-9]\d{0,14}$/.test(recordId.trim());
  const datesProblem =
    list.filters.from && list.filters.to && list.filters.from > list.filters.to
      ? 'From must be on or before To.'
      : null;
  const filtered = AUDIT_FILTERS.some((f) => list.filters[f]);

  return (
    <Paper variant="outlined" sx={{ p: 2 }}>
      <FilterBar>
        <FilterSelect
          label="Record type"
          value={list.filters.entityType}
          onChange={(type) => list.setFilter('entityType', type)}
          options={(facets.data?.entityTypes ?? []).map((t) => ({ value: t, label: t }))}
          width={170}
        />
        <TextField
          label="Record id"
          fullWidth={false}
          value={recordId}
          onChange={(e) => setRecordId(e.target.value)}
          error={!!idProblem}
          helperText={idProblem ? 'A whole number, e.g. 42.' : undefined}
          slotProps={{ htmlInput: { inputMode: 'numeric' } }}
          sx={{ width: 120 }}
        />
        <FilterSelect
          label="Person"
          allLabel="Everyone"
          value={list.filters.actorId}
          onChange={(actorId) => list.setFilter('actorId', actorId)}
          options={(facets.data?.people ?? []).map((p) => ({ value: String(p.id), label: p.name }))}
          width={200}
        />
        <FilterSelect
          label="Action"
          value={list.filters.action}
          onChange={(action) => list.setFilter('action', action)}
          options={(facets.data?.actions ?? []).map((a) => ({ value: a, label: a }))}
          width={210}
        />
        <TextField
          label="From"
          type="date"
          fullWidth={false}
          value={list.filters.from}
          onChange={(e) => list.setFilter('from', e.target.value)}
          slotProps={{ inputLabel: { shrink: true } }}
          sx={{ width: 160 }}
        />
        <TextField
          label="To"
          type="date"
          fullWidth={false}
          value={list.filters.to}
          onChange={(e) => list.setFilter('to', e.target.value)}
          error={!!datesProblem}
          helperText={datesProblem ?? undefined}
          slotProps={{ inputLabel: { shrink: true } }}
          sx={{ width: 160 }}
        />
        <Box sx={{ ml: 'auto' }}>
          <CsvDownloadButton
            path="/audit/export.csv"
            query={list.query}
            filename="audit-trail.csv"
          />
        </Box>
      </FilterBar>
      <DataTable
        {...list.tableProps}
        label="Audit trail"
        columns={columns}
        data={events.data}
        loading={events.isFetching}
        error={events.error}
        onRetry={() => void events.refetch()}
        getRowId={(e) => String(e.id)}
        emptyMessage={
          filtered ? 'No event matches these filters.' : 'Nothing has been recorded yet.'
        }
      />
    </Paper>
  );
}
