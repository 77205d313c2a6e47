import { Chip } from '@mui/material';
import { WorkListCard } from '@/components/work-list/work-list-card';
import { useInstruments } from '@/features/inspection/api/get-instruments';
import { instrumentKindLabels, labelOf } from '@/lib/labels';

/** Instruments due for calibration within 14 days or overdue: readings with an overdue one are refused. */
export function InstrumentsDueSection() {
  const due = useInstruments({ dueWithinDays: 14 });
  return (
    <WorkListCard
      title="Instruments due"
      tone="warning"
      urgent={false}
      query={due}
      total={due.data?.total}
      loadingLabel="Loading instruments due"
      items={
        due.isSuccess
          ? [...due.data.items]
              .sort((a, b) => a.daysToDue - b.daysToDue)
              .map((i) => ({
                key: i.id,
                primary: `${i.name} (${i.serial})`,
                secondary: `${labelOf(instrumentKindLabels, i.kind)} · due ${i.calibrationDueOn}`,
                aside: (
                  <Chip
                    size="small"
                    color={i.calibrationStatus === 'overdue' ? 'error' : 'warning'}
                    label={
                      i.calibrationStatus === 'overdue'
                        ? `Overdue ${-i.daysToDue} d: readings refused`
                        : `Due in ${i.daysToDue} d`
                    }
                  />
                ),
              }))
          : undefined
      }
      emptyText="No instrument is due for calibration in the next 14 days."
    />
  );
}
