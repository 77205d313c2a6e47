import CloudUploadOutlined from '@mui/icons-material/CloudUploadOutlined';
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
import { useRef, useState, type DragEvent } from 'react';
import { photoFileProblem, useUploadPhoto } from '@/features/photos/api/upload-photo';
import type { PhotoSampleOption } from '@/features/photos/types';
import { errorMessage } from '@/lib/query-client';
import { toasts } from '@/lib/toast-store';

interface PhotoUploaderProps {
  lotId: number;
  samples: readonly PhotoSampleOption[];
}

export function PhotoUploader({ lotId, samples }: PhotoUploaderProps) {
  const upload = useUploadPhoto(lotId);
  const input = useRef<HTMLInputElement>(null);
  const [sampleId, setSampleId] = useState('');
  const [caption, setCaption] = useState('');
  const [progress, setProgress] = useState<number | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [dragging, setDragging] = useState(false);

  const send = async (file: File | undefined) => {
    if (!file) return;
    const localProblem = photoFileProblem(file);
    setProblem(localProblem);
    if (localProblem) return;
    setProgress(0);
    try {
      await upload.mutateAsync({
        file,
        sampleId: sampleId ? Number(sampleId) : undefined,
        caption,
        onProgress: setProgress,
      });
      toasts.success(`${file.name} uploaded.`);
      setCaption('');
    } catch (error) {
      setProblem(`${file.name} was not saved: ${errorMessage(error)}`);
    } finally {
      setProgress(null);
      if (input.current) input.current.value = '';
    }
  };

  const onDrop = (event: DragEvent) => {
    event.preventDefault();
    setDragging(false);
    void send(event.dataTransfer.files[0]);
  };

  return (
    <Stack spacing={1.5}>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <TextField
          select
          label="Sample (optional)"
          value={sampleId}
          onChange={(e) => setSampleId(e.target.value)}
          sx={{ minWidth: 220 }}
        >
          <MenuItem value="">The lot as a whole</MenuItem>
          {samples.map((s) => (
            <MenuItem key={s.id} value={String(s.id)}>
              {s.label}
            </MenuItem>
          ))}
        </TextField>
        <TextField
          label="Caption (optional)"
          value={caption}
          onChange={(e) => setCaption(e.target.value)}
          fullWidth
          slotProps={{ htmlInput: { maxLength: 200 } }}
        />
      </Stack>
      <Box
        onDragOver={(e) => {
          e.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
        sx={{
          border: 2,
          borderStyle: 'dashed',
          borderColor: dragging ? 'primary.main' : 'divider',
          borderRadius: 1,
          p: 2,
          textAlign: 'center',
          bgcolor: dragging ? 'action.hover' : undefined,
        }}
      >
        <Typography color="text.secondary" gutterBottom>
          Drop a photo here (JPEG, PNG or WebP, at most 15 MB), or
        </Typography>
        <Button
          variant="outlined"
          startIcon={<CloudUploadOutlined />}
          onClick={() => input.current?.click()}
          disabled={progress !== null}
        >
          Choose a photo
        </Button>
        <input
          ref={input}
          type="file"
          hidden
          accept="image/jpeg,image/png,image/webp"
          aria-label="Photo file"
          onChange={(e) => void send(e.target.files?.[0])}
        />
      </Box>
      {progress !== null && (
        <Box>
          <LinearProgress
            variant="determinate"
            value={Math.round(progress * 100)}
            aria-label="Upload progress"
          />
          <Typography variant="caption">Uploading… {Math.round(progress * 100)} %</Typography>
        </Box>
      )}
      {problem && (
        <Alert severity="error" onClose={() => setProblem(null)}>
          {problem}
        </Alert>
      )}
    </Stack>
  );
}
