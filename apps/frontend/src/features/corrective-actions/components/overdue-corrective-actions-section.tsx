import { Button } from '@mui/material';
import { Link as RouterLink } from 'react-router';
import { WorkListCard } from '@/components/work-list/work-list-card';
import { paths } from '@/config/paths';
import { useCorrectiveActions } from '@/features/corrective-actions/api/get-corrective-actions';

const PARAMS = { overdue: 'true', pageSize: '10', sort: 'dueOn:asc' };

/** Today: the supplier responses that are late, the longest overdue first. */
export function OverdueCorrectiveActionsSection() {
  const cars = useCorrectiveActions(PARAMS);
  return (
    <WorkListCard
      title="Overdue corrective actions"
      countLabel={(n) => `${n} overdue`}
      urgent={false}
      query={cars}
      total={cars.data?.total}
      loadingLabel="Loading overdue corrective actions"
      noWrap
      items={
        cars.isSuccess
          ? cars.data.items.map((c) => ({
              key: c.id,
              href: paths.correctiveActionDetail.getHref(c.id),
              primary: `${c.number} · ${c.supplier.name}`,
              secondary: `Due ${c.dueOn} · ${c.problem}`,
            }))
          : undefined
      }
      emptyText="No supplier response is overdue."
      footer={
        <Button
          component={RouterLink}
          to={`${paths.correctiveActions.getHref()}?overdue=true`}
          size="small"
          sx={{ mt: 1 }}
        >
          All corrective actions
        </Button>
      }
    />
  );
}
