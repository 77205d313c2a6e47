import ScaleOutlined from '@mui/icons-material/ScaleOutlined';
import { Button, Stack, Typography } from '@mui/material';
import { useEffect, useState } from 'react';
import type { BalanceLine } from '@/features/inspection/lib/balance-line';
import {
  connectedBalance,
  sharedBalance,
  type BalanceReader,
} from '@/features/inspection/lib/serial-balance';

type State =
  | { status: 'idle' }
  | { status: 'connecting' }
  | { status: 'on'; line: BalanceLine | null; filled: string | null }
  | { status: 'error'; message: string };

/** grams → the text typed into the field, without binary noise (0.19504 kg → "195.04"). */
export const gramsText = (grams: number) => String(Number(grams.toPrecision(12)));

/**
 * Reads a bench balance over Web Serial and fills the mass when it settles. Loaded only in
 * browsers that have serial ports, and only in bench mode.
 */
export default function BalanceButton({ onValue }: { onValue: (text: string) => void }) {
  const [state, setState] = useState<State>(() =>
    connectedBalance() ? { status: 'on', line: null, filled: null } : { status: 'idle' },
  );
  const [reader, setReader] = useState<BalanceReader | null>(() => connectedBalance());

  useEffect(() => {
    if (!reader) return undefined;
    return reader.subscribe({
      onLine: (line) => setState((s) => (s.status === 'on' ? { ...s, line } : s)),
      onStable: (grams) => {
        if (grams <= 0) return;
        const text = gramsText(grams);
        onValue(text);
        setState((s) => (s.status === 'on' ? { ...s, filled: text } : s));
      },
      onClosed: (error) => {
        setReader(null);
        setState({
          status: 'error',
          message: `The balance was disconnected${error instanceof Error ? `: ${error.message}` : ''}. Connect again or type the value.`,
        });
      },
    });
  }, [reader, onValue]);

  const connect = async () => {
    setState({ status: 'connecting' });
    try {
      const r = await sharedBalance();
      setReader(r);
      setState({ status: 'on', line: null, filled: null });
    } catch (error) {
      setState({
        status: 'error',
        message: `No balance connected: ${error instanceof Error ? error.message : String(error)}. Type the value instead.`,
      });
    }
  };

  let says = '';
  if (state.status === 'on') {
    const { line, filled } = state;
    if (line?.kind === 'mass') {
      says = `Balance shows ${line.text}${line.stable === false ? ' — settling' : ''}`;
    } else if (line?.kind === 'overload') says = 'Balance is out of its range';
    else if (line?.kind === 'unknown') says = `Line not understood, shown as sent: «${line.raw}»`;
    else says = 'Balance connected; waiting for a weight';
    if (filled) says += ` · filled in ${filled} g when stable`;
  } else if (state.status === 'error') says = state.message;

  return (
    <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
      {state.status !== 'on' && (
        <Button
          size="small"
          variant="outlined"
          startIcon={<ScaleOutlined />}
          loading={state.status === 'connecting'}
          onClick={() => void connect()}
        >
          Read the balance
        </Button>
      )}
      {says && (
        <Typography
          variant="body2"
          role="status"
          aria-label="Balance"
          color={state.status === 'error' ? 'error' : 'text.secondary'}
        >
          {says}
        </Typography>
      )}
    </Stack>
  );
}
