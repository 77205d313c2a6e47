import { zodResolver } from '@hookform/resolvers/zod';
import {
  Alert,
  Box,
  Button,
  Card,
  CardContent,
  Container,
  Link,
  List,
  ListItem,
  ListItemText,
  Skeleton,
  Stack,
  TextField,
  Typography,
} from '@mui/material';
import { useRef, useState } from 'react';
import { useForm } from 'react-hook-form';
import {
  answerSchema,
  MAX_FILE_BYTES,
  portalEvidenceUrl,
  portalPhotoUrl,
  usePortalRequest,
  useSendAnswer,
  useUploadFile,
  type AnswerInput,
  type PortalRequest,
  type PortalReturn,
} from '@/features/supplier-portal/api/portal';
import { isApiError } from '@/lib/api-client';
import { isoDayOf } from '@/lib/dates';
import { errorMessage } from '@/lib/query-client';
import { splitServerErrors } from '@/lib/server-field-errors';
import { countOf } from '@/lib/counts';
import { megabytes } from '@/lib/contract-rules';

const FIELDS = ['containment', 'rootCause', 'correctiveAction', 'promisedOn'] as const;
const ACCEPT = 'application/pdf,image/jpeg,image/png,image/webp';

function Fact({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div>
      <Typography variant="caption" color="text.secondary" component="div">
        {label}
      </Typography>
      <Typography component="div" sx={{ whiteSpace: 'pre-wrap', overflowWrap: 'anywhere' }}>
        {children}
      </Typography>
    </div>
  );
}

function AnswerForm({ token, req }: { token: string; req: PortalRequest }) {
  const send = useSendAnswer(token);
  const form = useForm<AnswerInput>({
    resolver: zodResolver(answerSchema),
    mode: 'onBlur',
    defaultValues: {
      containment: req.answer.containment ?? '',
      rootCause: req.answer.rootCause ?? '',
      correctiveAction: req.answer.correctiveAction ?? '',
      promisedOn: req.answer.promisedOn ?? '',
    },
  });
  const { errors, isSubmitting } = form.formState;
  const formErrors = send.isError ? splitServerErrors(send.error, FIELDS).formErrors : [];
  const onSubmit = form.handleSubmit(async (input) => {
    try {
      await send.mutateAsync(input);
    } catch (error) {
      const { fieldErrors } = splitServerErrors(error, FIELDS);
      for (const f of FIELDS)
        if (fieldErrors[f]) form.setError(f, { type: 'server', message: fieldErrors[f] });
    }
  });
  const area = (name: (typeof FIELDS)[number], label: string, helper: string) => (
    <TextField
      label={label}
      multiline
      minRows={3}
      error={!!errors[name]}
      helperText={errors[name]?.message ?? helper}
      {...form.register(name)}
    />
  );
  return (
    <form noValidate onSubmit={onSubmit} aria-label="Your answer">
      <Stack spacing={2}>
        {formErrors.length > 0 && <Alert severity="error">{formErrors.join(' ')}</Alert>}
        {area(
          'containment',
          'Containment',
          'What you did with suspect stock: at your plant, in transit, at distributors.',
        )}
        {area('rootCause', 'Root cause', 'Why it happened.')}
        {area(
          'correctiveAction',
          'Corrective action',
          'What you changed so it cannot happen again.',
        )}
        <TextField
          label="In place by"
          type="date"
          slotProps={{ inputLabel: { shrink: true } }}
          error={!!errors.promisedOn}
          helperText={errors.promisedOn?.message ?? 'The date the corrective action is in place.'}
          {...form.register('promisedOn')}
        />
        <div>
          <Button type="submit" variant="contained" size="large" loading={isSubmitting}>
            Send the answer
          </Button>
        </div>
      </Stack>
    </form>
  );
}

function Files({ token, req }: { token: string; req: PortalRequest }) {
  const upload = useUploadFile(token);
  const input = useRef<HTMLInputElement>(null);
  const [tooBig, setTooBig] = useState<string | null>(null);
  const open = req.status !== 'verified' && req.status !== 'closed';
  const onPick = (file: File | undefined) => {
    setTooBig(null);
    if (!file) return;
    if (file.size > MAX_FILE_BYTES) {
      setTooBig(
        `${file.name} is larger than ${megabytes(MAX_FILE_BYTES)}: send a smaller PDF or photo.`,
      );
      return;
    }
    upload.mutate(file, { onSettled: () => input.current && (input.current.value = '') });
  };
  return (
    <Stack spacing={1}>
      {req.attachments.length === 0 ? (
        <Typography color="text.secondary">No files yet.</Typography>
      ) : (
        <List dense disablePadding aria-label="Your files">
          {req.attachments.map((a) => (
            <ListItem key={`${a.filename}-${a.addedAt}`} disableGutters>
              <ListItemText
                primary={a.filename}
                secondary={`${(a.sizeBytes / 1024).toFixed(0)} KB`}
              />
            </ListItem>
          ))}
        </List>
      )}
      {tooBig && <Alert severity="error">{tooBig}</Alert>}
      {upload.isError && <Alert severity="error">{errorMessage(upload.error)}</Alert>}
      {open && (
        <div>
          <input
            ref={input}
            type="file"
            accept={ACCEPT}
            hidden
            aria-label="File to send"
            onChange={(e) => onPick(e.target.files?.[0])}
          />
          <Button
            variant="outlined"
            loading={upload.isPending}
            onClick={() => input.current?.click()}
          >
            Add a file (PDF or photo, up to {megabytes(MAX_FILE_BYTES)})
          </Button>
        </div>
      )}
    </Stack>
  );
}

function Deliveries({ lots }: { lots: PortalRequest['lots'] }) {
  return lots.map((l) => (
    <Fact key={`${l.poNumber}-${l.receivedOn}`} label="Delivery">
      PO {l.poNumber}
      {l.supplierLotCode ? ` · your lot ${l.supplierLotCode}` : ''}
      {l.packingSlip ? ` · packing slip ${l.packingSlip}` : ''} · received {l.receivedOn} ·{' '}
      {countOf(l.quantity, l.unit)}
    </Fact>
  ));
}

const money = (amount: number, currency: string) =>
  `${currency} ${amount.toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 })}`;

/** A return notice's page: what was found, the photos of those lots, the evidence pack. */
function ReturnNotice({ token, r }: { token: string; r: PortalReturn }) {
  return (
    <Stack spacing={3}>
      <div>
        <Typography variant="h1" sx={{ fontSize: { xs: '1.75rem', sm: '2.25rem' } }}>
          Return notice {r.number}
        </Typography>
        <Typography color="text.secondary">
          For {r.supplier.name}
          {r.emailedOn ? ` · sent ${r.emailedOn}` : ''}
          {r.rmaNumber ? ` · your RMA ${r.rmaNumber}` : ''} · this link works until{' '}
          {isoDayOf(r.linkExpiresAt)}
        </Typography>
      </div>
      <Card>
        <CardContent>
          <Stack spacing={2}>
            <Typography variant="h2" sx={{ fontSize: '1.25rem' }}>
              What was found
            </Typography>
            <Typography>
              These deliveries failed our receiving inspection and are coming back to you.
            </Typography>
            {r.note && <Fact label="Why">{r.note}</Fact>}
            <Deliveries lots={r.lots} />
            <Fact label="Chargeback for inspection and handling">
              {money(r.chargeback.amount, r.chargeback.currency)}
            </Fact>
            <Link href={portalEvidenceUrl(token)} target="_blank" rel="noopener">
              Evidence pack {r.evidencePack.number} (PDF: sampling plan, every reading with its
              uncertainty, the decision)
            </Link>
          </Stack>
        </CardContent>
      </Card>
      <Card>
        <CardContent>
          <Typography variant="h2" sx={{ fontSize: '1.25rem', mb: 2 }}>
            Photos ({r.photos.length})
          </Typography>
          {r.photos.length === 0 ? (
            <Typography color="text.secondary">
              No photos were taken of these deliveries.
            </Typography>
          ) : (
            <Box
              component="ul"
              aria-label="Photos"
              sx={{
                listStyle: 'none',
                p: 0,
                m: 0,
                display: 'grid',
                gap: 2,
                gridTemplateColumns: 'repeat(auto-fill, minmax(150px, 1fr))',
              }}
            >
              {r.photos.map((p) => (
                <li key={p.n}>
                  <Link href={portalPhotoUrl(token, p.n)} target="_blank" rel="noopener">
                    <Box
                      component="img"
                      src={portalPhotoUrl(token, p.n, 'thumbnail')}
                      alt={`Photo ${p.n}, PO ${p.poNumber}`}
                      loading="lazy"
                      sx={{
                        width: '100%',
                        aspectRatio: '4 / 3',
                        objectFit: 'cover',
                        borderRadius: 1,
                      }}
                    />
                  </Link>
                  <Typography variant="caption" color="text.secondary">
                    Photo {p.n} · PO {p.poNumber} · {p.takenOn}
                  </Typography>
                </li>
              ))}
            </Box>
          )}
        </CardContent>
      </Card>
      <Alert severity="info">
        To confirm the return or ask a question, reply to the e-mail this link came with: it goes to
        the buyer who sent it.
      </Alert>
    </Stack>
  );
}

/**
 * The supplier's page, reached from the e-mailed link without an account: what was found,
 * the answer form, the files. It shows this one request and nothing else.
 */
export function SupplierPortalPage({ token }: { token: string }) {
  const req = usePortalRequest(token);
  if (req.isPending) return <Skeleton variant="rounded" height={320} aria-label="Loading" />;
  if (req.isError) {
    const refused = isApiError(req.error) && [404, 410].includes(req.error.status);
    return (
      <Alert severity={refused ? 'warning' : 'error'} role="alert">
        <Typography variant="h6" component="h1" gutterBottom>
          {refused ? 'This link cannot be used' : 'The page could not be loaded'}
        </Typography>
        <Typography>{errorMessage(req.error)}</Typography>
      </Alert>
    );
  }
  if (req.data.kind === 'return') return <ReturnNotice token={token} r={req.data} />;
  const r = req.data;
  return (
    <Stack spacing={3}>
      <div>
        <Typography variant="h1" sx={{ fontSize: { xs: '1.75rem', sm: '2.25rem' } }}>
          Corrective action request {r.number}
        </Typography>
        <Typography color="text.secondary">
          For {r.supplier.name} · answer by {r.dueOn} · this link works until{' '}
          {isoDayOf(r.linkExpiresAt)}
        </Typography>
      </div>
      {r.status === 'reopened' && r.reopenComment && (
        <Alert severity="warning">
          <strong>Your customer asks for more:</strong> {r.reopenComment}
        </Alert>
      )}
      {!r.canAnswer && (
        <Alert severity="success">
          {r.status === 'responded'
            ? `Your answer arrived${r.answer.respondedAt ? ` on ${isoDayOf(r.answer.respondedAt)}` : ''}. Your customer will review it.`
            : `This request is ${r.status}. Thank you.`}
        </Alert>
      )}
      <Card>
        <CardContent>
          <Stack spacing={2}>
            <Typography variant="h2" sx={{ fontSize: '1.25rem' }}>
              What was found
            </Typography>
            <Fact label="Problem">{r.problem}</Fact>
            <Deliveries lots={r.lots} />
            {r.evidencePack && (
              <Link href={portalEvidenceUrl(token)} target="_blank" rel="noopener">
                Evidence pack {r.evidencePack.number} (PDF: sampling plan, every reading, photos)
              </Link>
            )}
          </Stack>
        </CardContent>
      </Card>
      <Card>
        <CardContent>
          <Typography variant="h2" sx={{ fontSize: '1.25rem', mb: 2 }}>
            Your answer
          </Typography>
          {r.canAnswer ? (
            <AnswerForm key={r.status} token={token} req={r} />
          ) : (
            <Stack spacing={2}>
              <Fact label="Containment">{r.answer.containment ?? '—'}</Fact>
              <Fact label="Root cause">{r.answer.rootCause ?? '—'}</Fact>
              <Fact label="Corrective action">{r.answer.correctiveAction ?? '—'}</Fact>
              <Fact label="In place by">{r.answer.promisedOn ?? '—'}</Fact>
            </Stack>
          )}
        </CardContent>
      </Card>
      <Card>
        <CardContent>
          <Typography variant="h2" sx={{ fontSize: '1.25rem', mb: 1 }}>
            Files
          </Typography>
          <Files token={token} req={r} />
        </CardContent>
      </Card>
    </Stack>
  );
}

/** The bare frame of the supplier's page: no navigation, nothing of the customer's app. */
export function SupplierPortalFrame({ children }: { children: React.ReactNode }) {
  return (
    <Box sx={{ minHeight: '100vh', bgcolor: 'background.default', py: { xs: 2, sm: 4 } }}>
      <Container maxWidth="md">{children}</Container>
    </Box>
  );
}
