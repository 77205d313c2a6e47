import ArrowForwardOutlined from '@mui/icons-material/ArrowForwardOutlined';
import {
  Alert,
  Box,
  Button,
  LinearProgress,
  MenuItem,
  Stack,
  TextField,
  Typography,
} from '@mui/material';
import { useQueryClient } from '@tanstack/react-query';
import { lazy, Suspense, useMemo, useState, type ReactNode } from 'react';
import { recordBenchReading } from '@/features/inspection/api/record-bench-reading';
import { useBenchQueue } from '@/features/inspection/api/use-bench-queue';
import { BenchVerdict } from '@/features/inspection/components/bench/bench-verdict';
import { HeldReadings } from '@/features/inspection/components/bench/held-readings';
import { WaitingReadings } from '@/features/inspection/components/bench/waiting-readings';
import { ReadingForm } from '@/features/inspection/components/reading-form';
import {
  benchTargets,
  isDone,
  nextTarget,
  preferredMethod,
  targetKey,
  type BenchTarget,
} from '@/features/inspection/lib/bench';
import {
  checkRemembered,
  readBenchMemory,
  writeBenchMemory,
  type BenchMemory,
} from '@/features/inspection/lib/bench-memory';
import { conductorLabel, verdictLabels } from '@/features/inspection/lib/labels';
import type { InputField, MethodDefinition } from '@/features/inspection/lib/reading-methods';
import type { ReadingFormValues, ReadingRequest } from '@/features/inspection/lib/reading-form';
import type { Instrument, LotDetail, Reading, ReadingMethod } from '@/features/inspection/types';
import type { Recorder } from '@/features/inspection/lib/offline-queue';
import { queryKeys } from '@/lib/query-keys';

// The serial code loads only where the browser has serial ports, on first use of bench mode.
const BalanceButton = lazy(() => import('@/features/inspection/components/bench/balance-button'));
const hasSerial = () => typeof navigator !== 'undefined' && 'serial' in navigator;

const balanceAction = (field: InputField, fill: (text: string) => void): ReactNode =>
  field.name === 'massG' && hasSerial() ? (
    <Suspense fallback={null}>
      <BalanceButton onValue={fill} />
    </Suspense>
  ) : null;

/** Fields whose value a bench keeps from one piece to the next, per method. */
const KEPT_FIELDS = ['lengthMm'] as const;

interface BenchPanelProps {
  lot: LotDetail;
  instruments: readonly Instrument[];
  canRecord: boolean;
  /** The signed-in user: readings kept offline are bound to them (and sent only by them). */
  user: Recorder;
}

const pieceLabel = (
  t: { seq: number; conductor: BenchTarget['conductor'] },
  oneConductor: boolean,
) => (oneConductor ? `Unit ${t.seq}` : `Unit ${t.seq} · ${conductorLabel(t.conductor)}`);

/**
 * Bench mode: one planned piece at a time, the fields to type, Enter to record, the verdict
 * large, then the next piece. The instruments and the cut length stay from piece to piece
 * on this device.
 */
export function BenchPanel({ lot, instruments, canRecord, user }: BenchPanelProps) {
  const queryClient = useQueryClient();
  const targets = useMemo(() => benchTargets(lot), [lot]);
  const oneConductor = lot.product.conductors.length === 1;
  const [recorded, setRecorded] = useState<ReadonlyMap<string, number>>(new Map());
  const queue = useBenchQueue(lot.id, user);
  // Readings waiting on this device, whoever took them, are taken: the plan moves past them.
  const recordedKeys = useMemo(
    () =>
      new Set([
        ...recorded.keys(),
        ...queue.all.map((e) => targetKey({ seq: e.seq, conductor: { id: e.conductorId } })),
      ]),
    [recorded, queue.all],
  );
  const [chosenKey, setChosenKey] = useState<string | undefined>(undefined);
  const [last, setLast] = useState<{ key: string; reading: Reading | null } | null>(null);
  const [memory, setMemory] = useState<BenchMemory>(() => readBenchMemory());
  const remembered = useMemo(
    () => checkRemembered(memory.instruments, instruments),
    [memory.instruments, instruments],
  );

  const current =
    targets.find((t) => targetKey(t) === chosenKey) ??
    nextTarget(targets, undefined, recordedKeys) ??
    targets[0];
  // Recorded means the server has it; a reading kept on the device is only waiting to send.
  const [sent, setSent] = useState<ReadonlySet<string>>(new Set());
  const waitingKeys = useMemo(
    () =>
      new Set(
        queue.all
          .filter((e) => e.refused === null)
          .map((e) => targetKey({ seq: e.seq, conductor: { id: e.conductorId } })),
      ),
    [queue.all],
  );
  const isRecorded = (t: BenchTarget) => isDone(t) || sent.has(targetKey(t));
  const doneCount = targets.filter(isRecorded).length;
  const waitingCount = targets.filter(
    (t) => !isRecorded(t) && waitingKeys.has(targetKey(t)),
  ).length;
  const following = current ? nextTarget(targets, targetKey(current), recordedKeys) : undefined;

  if (!current) {
    return <Alert severity="info">This product has no active conductor to sample.</Alert>;
  }
  const key = targetKey(current);
  const label = pieceLabel(current, oneConductor);

  const initial = (definition: MethodDefinition): Partial<ReadingFormValues> => ({
    instruments: remembered.usable,
    values: Object.fromEntries(
      KEPT_FIELDS.map((f) => [f, memory.values[`${definition.method}:${f}`] ?? '']),
    ),
  });

  const record = async (request: ReadingRequest): Promise<Reading | null> => {
    const known = current.sample?.id ?? recorded.get(key);
    const reading = await recordBenchReading(
      {
        lotId: lot.id,
        conductorId: current.conductor.id,
        seq: current.seq,
        sampleId: known || undefined,
        label,
      },
      request,
      user,
    );
    if (reading) void queryClient.invalidateQueries({ queryKey: queryKeys.lots.all });
    else void queue.refresh();
    return reading;
  };

  const onRecorded = (
    reading: Reading | null,
    values: ReadingFormValues,
    method: ReadingMethod,
  ) => {
    const next: BenchMemory = {
      instruments: { ...memory.instruments, ...values.instruments },
      values: { ...memory.values },
    };
    for (const f of KEPT_FIELDS) {
      const v = values.values[f];
      if (v) next.values[`${method}:${f}`] = v;
    }
    writeBenchMemory(next);
    setMemory(next);
    setRecorded((m) => new Map(m).set(key, reading?.sampleId ?? m.get(key) ?? 0));
    if (reading) setSent((all) => new Set(all).add(key));
    // Stay on this piece to show its verdict; "next" moves on.
    setChosenKey(key);
    setLast({ key, reading });
  };

  const goTo = (t: BenchTarget | undefined) => {
    setLast(null);
    setChosenKey(t ? targetKey(t) : undefined);
  };

  return (
    <Stack spacing={2}>
      <Box>
        <Stack direction="row" sx={{ justifyContent: 'space-between', alignItems: 'baseline' }}>
          <Typography component="p" sx={{ fontWeight: 700 }}>
            {doneCount} of {targets.length} pieces recorded
            {waitingCount > 0 ? ` · ${waitingCount} waiting to send` : ''}
          </Typography>
          <Typography variant="body2" color="text.secondary">
            plan: {lot.samplingPlan.sampleSize} unit{lot.samplingPlan.sampleSize === 1 ? '' : 's'}
            {oneConductor ? '' : ` × ${lot.product.conductors.length} conductors`}
          </Typography>
        </Stack>
        <LinearProgress
          variant={waitingCount > 0 ? 'buffer' : 'determinate'}
          value={targets.length ? (100 * doneCount) / targets.length : 0}
          valueBuffer={targets.length ? (100 * (doneCount + waitingCount)) / targets.length : 0}
          aria-label="Progress through the plan"
          sx={{ height: 10, borderRadius: 5, mt: 0.5 }}
        />
      </Box>

      <TextField
        select
        size="small"
        label="Piece"
        value={key}
        onChange={(e) => goTo(targets.find((t) => targetKey(t) === e.target.value))}
      >
        {targets.map((t) => {
          const k = targetKey(t);
          const state = waitingKeys.has(k)
            ? 'waiting to send'
            : recordedKeys.has(k)
              ? 'recorded here'
              : t.sample
                ? verdictLabels[t.sample.verdict].toLowerCase()
                : 'not cut';
          return (
            <MenuItem key={k} value={k}>
              {pieceLabel(t, oneConductor)} — {state}
            </MenuItem>
          );
        })}
      </TextField>

      <Box>
        <Typography variant="h4" component="h2" sx={{ fontWeight: 700 }}>
          {label}
        </Typography>
        <Typography color="text.secondary">
          {conductorLabel(current.conductor)} ·{' '}
          {current.sample || recorded.has(key)
            ? 'piece already cut'
            : `cut a piece from unit ${current.seq}`}{' '}
          ·{' '}
          {preferredMethod(current.conductor) === 'mass'
            ? 'strip it and weigh all its strands'
            : 'measure its diameter'}
        </Typography>
      </Box>

      <WaitingReadings
        entries={queue.entries}
        sending={queue.sending}
        onSend={() => void queue.send()}
        onDiscard={(id) => void queue.discard(id)}
      />
      <HeldReadings entries={queue.held} onClaim={(id) => void queue.claim(id)} />

      {remembered.refused.map((reason) => (
        <Alert key={reason} severity="warning">
          {reason}
        </Alert>
      ))}

      {last?.key === key ? (
        <Stack spacing={2}>
          <BenchVerdict reading={last.reading} label={label} />
          {following ? (
            <Button
              variant="contained"
              size="large"
              autoFocus
              endIcon={<ArrowForwardOutlined />}
              onClick={() => goTo(following)}
              sx={{ py: 1.5, fontSize: '1.1rem' }}
            >
              Next: {pieceLabel(following, oneConductor)}
            </Button>
          ) : (
            <Alert severity={waitingCount > 0 ? 'info' : 'success'}>
              {waitingCount > 0
                ? `Every planned piece has a reading; ${waitingCount} still waiting to send. They go when the network returns; a QA lead decides the lot after that.`
                : 'Every planned piece has a reading. A QA lead decides the lot from here.'}
            </Alert>
          )}
          <Button onClick={() => setLast(null)}>Another reading on {label}</Button>
        </Stack>
      ) : canRecord ? (
        <ReadingForm
          key={key}
          sampleId={current.sample?.id ?? recorded.get(key) ?? 0}
          conductor={current.conductor}
          minAreaRatio={lot.product.minAreaRatio}
          instruments={instruments}
          defaultMethod={preferredMethod(current.conductor)}
          initial={initial}
          record={record}
          onRecorded={onRecorded}
          autoFocus
          fieldAction={balanceAction}
        />
      ) : (
        <Alert severity="info">
          This lot is no longer open, or your role does not record readings.
        </Alert>
      )}
    </Stack>
  );
}
