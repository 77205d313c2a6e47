import CloudUploadOutlined from '@mui/icons-material/CloudUploadOutlined';
import PhotoCameraOutlined from '@mui/icons-material/PhotoCameraOutlined';
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
import { MAX_PHOTO_BYTES, TEXT_MAX } from '@gaugeproof/api-types';
import { megabytes } from '@/lib/contract-rules';

interface PhotoUploaderProps {
  lotId: number;
  samples: readonly PhotoSampleOption[];
}

const ACCEPT = 'image/jpeg,image/png,image/webp';

/** One file of a batch: waiting, sending (0…1), sent, or refused with the reason. */
interface Job {
  key: number;
  name: string;
  state: 'waiting' | 'sending' | 'sent' | 'refused';
  progress: number;
  message?: string;
}

let nextKey = 1;

/**
 * Photos for the lot or one of its samples: "Take photos" opens the camera directly
 * (`capture`), "Choose photos" takes several at once; each file is sent in turn with its
 * own progress. The sample and caption chosen go with the batch, then reset to the lot as
 * a whole, so the next photo is never filed under the last sample by mistake.
 */
export function PhotoUploader({ lotId, samples }: PhotoUploaderProps) {
  const upload = useUploadPhoto(lotId);
  const camera = useRef<HTMLInputElement>(null);
  const picker = useRef<HTMLInputElement>(null);
  const [sampleId, setSampleId] = useState('');
  const [caption, setCaption] = useState('');
  const [jobs, setJobs] = useState<readonly Job[]>([]);
  const [dragging, setDragging] = useState(false);
  const busy = jobs.some((j) => j.state === 'waiting' || j.state === 'sending');

  const patch = (key: number, change: Partial<Job>) =>
    setJobs((all) => all.map((j) => (j.key === key ? { ...j, ...change } : j)));

  const send = async (list: FileList | null | undefined) => {
    const files = list ? [...list] : [];
    if (files.length === 0 || busy) return;
    const chosen = { sampleId: sampleId ? Number(sampleId) : undefined, caption };
    const batch: Job[] = files.map((f) => {
      const problem = photoFileProblem(f);
      return problem
        ? { key: nextKey++, name: f.name, state: 'refused', progress: 0, message: problem }
        : { key: nextKey++, name: f.name, state: 'waiting', progress: 0 };
    });
    setJobs(batch);
    if (camera.current) camera.current.value = '';
    if (picker.current) picker.current.value = '';
    let sent = 0;
    for (const [i, file] of files.entries()) {
      const job = batch[i];
      if (job.state === 'refused') continue;
      patch(job.key, { state: 'sending' });
      try {
        await upload.mutateAsync({
          file,
          sampleId: chosen.sampleId,
          caption: chosen.caption,
          onProgress: (progress) => patch(job.key, { progress }),
        });
        patch(job.key, { state: 'sent', progress: 1 });
        sent += 1;
      } catch (error) {
        patch(job.key, { state: 'refused', message: errorMessage(error) });
      }
    }
    // The batch is filed: the next photo starts from the lot as a whole, without a caption.
    setSampleId('');
    setCaption('');
    if (sent > 0) toasts.success(sent === 1 ? 'Photo uploaded.' : `${sent} photos uploaded.`);
  };

  const onDrop = (event: DragEvent) => {
    event.preventDefault();
    setDragging(false);
    void send(event.dataTransfer.files);
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
          disabled={busy}
          slotProps={{ select: { displayEmpty: true }, inputLabel: { shrink: true } }}
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
          disabled={busy}
          slotProps={{ htmlInput: { maxLength: TEXT_MAX.description } }}
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
          JPEG, PNG or WebP, at most {megabytes(MAX_PHOTO_BYTES)} each; drop files here, or
        </Typography>
        <Stack
          direction="row"
          spacing={1.5}
          sx={{ justifyContent: 'center', flexWrap: 'wrap', rowGap: 1 }}
        >
          <Button
            variant="contained"
            size="large"
            startIcon={<PhotoCameraOutlined />}
            onClick={() => camera.current?.click()}
            disabled={busy}
          >
            Take photos
          </Button>
          <Button
            variant="outlined"
            size="large"
            startIcon={<CloudUploadOutlined />}
            onClick={() => picker.current?.click()}
            disabled={busy}
          >
            Choose photos
          </Button>
        </Stack>
        <input
          ref={camera}
          type="file"
          hidden
          accept={ACCEPT}
          capture="environment"
          multiple
          aria-label="Photos from the camera"
          onChange={(e) => void send(e.target.files)}
        />
        <input
          ref={picker}
          type="file"
          hidden
          accept={ACCEPT}
          multiple
          aria-label="Photo files"
          onChange={(e) => void send(e.target.files)}
        />
      </Box>
      {jobs.length > 0 && (
        <Stack
          spacing={1}
          component="ul"
          sx={{ listStyle: 'none', p: 0, m: 0 }}
          aria-label="Uploads"
        >
          {jobs.map((job) => (
            <Box component="li" key={job.key}>
              {job.state === 'refused' ? (
                <Alert severity="error">
                  {job.name} was not saved: {job.message}
                </Alert>
              ) : (
                <>
                  <LinearProgress
                    variant="determinate"
                    value={Math.round(job.progress * 100)}
                    aria-label={`Upload of ${job.name}`}
                    color={job.state === 'sent' ? 'success' : 'primary'}
                  />
                  <Typography variant="caption">
                    {job.name}:{' '}
                    {job.state === 'waiting'
                      ? 'waiting'
                      : job.state === 'sent'
                        ? 'uploaded'
                        : `uploading… ${Math.round(job.progress * 100)} %`}
                  </Typography>
                </>
              )}
            </Box>
          ))}
        </Stack>
      )}
    </Stack>
  );
}
