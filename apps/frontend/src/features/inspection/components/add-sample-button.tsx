import AddOutlined from '@mui/icons-material/AddOutlined';
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
import { useCreateSample } from '@/features/inspection/api/create-sample';
import type { Sample } from '@/features/inspection/types';
import { errorMessage } from '@/lib/query-client';
import { TEXT_MAX } from '@gaugeproof/api-types';

interface AddSampleButtonProps {
  lotId: number;
  conductorId: number;
  conductorLabel: string;
  nextUnit: number;
  onAdded: (sample: Sample) => void;
}

export function AddSampleButton({
  lotId,
  conductorId,
  conductorLabel,
  nextUnit,
  onAdded,
}: AddSampleButtonProps) {
  const create = useCreateSample(lotId);
  const [open, setOpen] = useState(false);
  const [unitRef, setUnitRef] = useState('');
  const close = () => {
    setOpen(false);
    setUnitRef('');
    create.reset();
  };
  const add = async () => {
    try {
      const sample = await create.mutateAsync({
        conductorId,
        unitRef: unitRef.trim() || undefined,
      });
      close();
      onAdded(sample);
    } catch {
      // shown in the dialog
    }
  };
  return (
    <>
      <Button variant="outlined" startIcon={<AddOutlined />} onClick={() => setOpen(true)}>
        Add sample
      </Button>
      <Dialog open={open} onClose={close} fullWidth maxWidth="xs">
        <DialogTitle>Add a sample of the {conductorLabel} conductor</DialogTitle>
        <DialogContent>
          <DialogContentText sx={{ mb: 2 }}>
            This will be unit {nextUnit} of the plan.
          </DialogContentText>
          {create.isError && <Alert severity="error">{errorMessage(create.error)}</Alert>}
          <TextField
            label="Which unit (optional)"
            helperText="Spool or kit number as marked, e.g. spool 7."
            fullWidth
            value={unitRef}
            onChange={(e) => setUnitRef(e.target.value)}
            slotProps={{ htmlInput: { maxLength: TEXT_MAX.reference } }}
          />
        </DialogContent>
        <DialogActions>
          <Button onClick={close}>Cancel</Button>
          <Button variant="contained" loading={create.isPending} onClick={() => void add()}>
            Add sample
          </Button>
        </DialogActions>
      </Dialog>
    </>
  );
}
