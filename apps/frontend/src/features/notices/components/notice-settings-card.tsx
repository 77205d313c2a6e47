import {
  Alert,
  Card,
  CardContent,
  FormControlLabel,
  FormGroup,
  Radio,
  RadioGroup,
  Skeleton,
  Stack,
  Switch,
  Typography,
} from '@mui/material';
import {
  useMyNotices,
  useUpdateNotices,
  type NoticeSwitch,
} from '@/features/notices/api/notice-settings';
import { errorMessage } from '@/lib/query-client';

/** What each notice is, in the words of the person who gets it. */
const LABELS: Record<NoticeSwitch, { label: string; help: string }> = {
  lotAwaitsDecision: {
    label: 'A lot awaits my decision',
    help: 'Every planned unit is tested and the lot waits for a QA lead.',
  },
  lotRejectNumber: {
    label: 'A lot reaches its reject number',
    help: 'Enough nonconforming units to reject, often before every unit is tested.',
  },
  lotRejected: {
    label: 'A lot is rejected',
    help: 'It needs a return to the supplier and perhaps a corrective action.',
  },
  scarOverdue: {
    label: 'A corrective action falls overdue',
    help: 'The supplier has not answered by the date asked.',
  },
  scarAnswered: {
    label: 'A supplier answers a corrective action',
    help: 'Their containment, root cause and fix arrived through their link.',
  },
  concessionAwaitsApproval: {
    label: 'A concession awaits my approval',
    help: 'Another QA lead asks to accept a lot against a reject; it needs a second approver.',
  },
};

/** The profile page's e-mail notices: one switch each, single e-mails or a daily digest. */
export function NoticeSettingsCard({ email }: { email: string }) {
  const notices = useMyNotices();
  const update = useUpdateNotices();
  if (notices.isPending) return <Skeleton variant="rounded" height={240} />;
  if (notices.isError) return <Alert severity="error">{errorMessage(notices.error)}</Alert>;
  const { choices, offered, digestHourUtc } = notices.data;
  const hour = `${String(digestHourUtc).padStart(2, '0')}:00 UTC`;
  return (
    <Card>
      <CardContent>
        <Stack spacing={2}>
          <div>
            <Typography variant="h4" component="h2">
              E-mail notices
            </Typography>
            <Typography color="text.secondary">
              Sent to {email}. Each change is saved at once.
            </Typography>
          </div>
          {offered.length === 0 ? (
            <Typography>Your role gets no e-mail notices.</Typography>
          ) : (
            <>
              <FormGroup aria-label="Tell me by e-mail when">
                {offered.map((s) => (
                  <FormControlLabel
                    key={s}
                    sx={{ alignItems: 'flex-start', mb: 1 }}
                    control={
                      <Switch
                        checked={choices[s]}
                        disabled={update.isPending}
                        onChange={(e) => update.mutate({ [s]: e.target.checked })}
                      />
                    }
                    label={
                      <div>
                        <Typography>{LABELS[s].label}</Typography>
                        <Typography variant="body2" color="text.secondary">
                          {LABELS[s].help}
                        </Typography>
                      </div>
                    }
                  />
                ))}
              </FormGroup>
              <div>
                <Typography variant="subtitle1" component="h3" id="delivery-label">
                  How
                </Typography>
                <RadioGroup
                  aria-labelledby="delivery-label"
                  value={choices.digest ? 'digest' : 'single'}
                  onChange={(e) => update.mutate({ digest: e.target.value === 'digest' })}
                >
                  <FormControlLabel
                    value="single"
                    control={<Radio disabled={update.isPending} />}
                    label="One e-mail for each notice, as it happens"
                  />
                  <FormControlLabel
                    value="digest"
                    control={<Radio disabled={update.isPending} />}
                    label={`One daily digest with all of them, after ${hour}`}
                  />
                </RadioGroup>
              </div>
            </>
          )}
          {update.isError && <Alert severity="error">{errorMessage(update.error)}</Alert>}
        </Stack>
      </CardContent>
    </Card>
  );
}
