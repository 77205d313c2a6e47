import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogContentText,
  DialogTitle,
  TextField,
} from '@mui/material';
import { useState } from 'react';
import { useUpdateCorrectiveAction } from '@/features/corrective-actions/api/update-corrective-action';
import type { CorrectiveAction } from '@/features/corrective-actions/types';
import { errorMessage } from '@/lib/query-client';
import { toasts } from '@/lib/toast-store';
import { TEXT_MIN } from '@gaugeproof/api-types';

const texts = {
  reopened: {
    title: 'Reopen: ask the supplier for more',
    label: 'What more the supplier must do',
    help: 'E-mailed to the supplier with a new link to its page.',
    button: 'Reopen and e-mail',
  },
  verified: {
    title: 'Verify the corrective action',
    label: 'Evidence that the fix works',
    help: 'For example: later deliveries measured, the 8D report checked, a visit. Your name and the time are recorded.',
    button: 'Verify',
  },
} as const;

/** Reopen (with the comment e-mailed) or verify (with evidence): both need words. */
export function CarStepDialog({
  car,
  step,
  onClose,
}: {
  car: CorrectiveAction;
  step: 'reopened' | 'verified';
  onClose: () => void;
}) {
  const move = useUpdateCorrectiveAction({ inlineErrors: true });
  const [text, setText] = useState('');
  const [touched, setTouched] = useState(false);
  const t = texts[step];
  const short = text.trim().length < TEXT_MIN.answer;
  const submit = () => {
    setTouched(true);
    if (short) return;
    move.mutate(
      {
        id: car.id,
        patch: {
          version: car.version,
          status: step,
          ...(step === 'reopened' ? { comment: text.trim() } : { verificationNote: text.trim() }),
        },
      },
      {
        onSuccess: (c) => {
          const mail = (c as { mail?: { status: string; to?: string; error?: string } }).mail;
          toasts.success(
            step === 'verified'
              ? `${c.number} is verified.`
              : `${c.number} is reopened${mail?.to ? `; the comment went to ${mail.to}` : ''}.`,
          );
          if (mail && mail.status !== 'sent' && mail.status !== 'queued')
            toasts.show(`The e-mail to the supplier: ${mail.error ?? mail.status}`, 'warning');
          onClose();
        },
      },
    );
  };
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm">
      <DialogTitle>
        {t.title} · {car.number}
      </DialogTitle>
      <DialogContent>
        <DialogContentText sx={{ mb: 2 }}>{t.help}</DialogContentText>
        {move.isError && (
          <Alert severity="error" sx={{ mb: 2 }}>
            {errorMessage(move.error)}
          </Alert>
        )}
        <TextField
          autoFocus
          fullWidth
          multiline
          minRows={3}
          label={t.label}
          value={text}
          onChange={(e) => setText(e.target.value)}
          onBlur={() => setTouched(true)}
          error={touched && short}
          helperText={touched && short ? `Write at least ${TEXT_MIN.answer} characters.` : ' '}
        />
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Back</Button>
        <Button variant="contained" loading={move.isPending} onClick={submit}>
          {t.button}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
