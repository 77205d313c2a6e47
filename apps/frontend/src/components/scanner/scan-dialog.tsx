import {
  Alert,
  Box,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Typography,
  useMediaQuery,
  useTheme,
} from '@mui/material';
import { useEffect, useRef, useState } from 'react';
import { createCodeReader, type CodeReader } from './barcode-reader';
import { FORMAT_LABELS, type DockFormat, type ScannedCode } from './scan-codes';

export interface ScanDialogProps {
  title: string;
  /** The button that closes without a code ("Type it instead" beside a field). */
  cancelLabel: string;
  formats: readonly DockFormat[];
  onCode: (code: ScannedCode) => void;
  onClose: () => void;
}

type State =
  | { status: 'starting' }
  | { status: 'looking'; kind: CodeReader['kind'] }
  | { status: 'error'; message: string };

/** How often a frame is handed to the reader: enough for a hand-held label. */
const FRAME_MS = 200;

function cameraError(error: unknown): string {
  const name = error instanceof DOMException ? error.name : '';
  if (name === 'NotAllowedError' || name === 'SecurityError')
    return 'The camera is not allowed for this page. Allow it in the browser, or type the code.';
  if (name === 'NotFoundError' || name === 'OverconstrainedError')
    return 'This device has no camera. Type the code instead.';
  if (name === 'NotReadableError')
    return 'The camera is in use by another app. Close it, or type the code.';
  return `The camera did not start${error instanceof Error ? `: ${error.message}` : ''}. Type the code instead.`;
}

/**
 * The camera and the code reader, loaded on first use (a scan button's dialog). Reads
 * frames until one holds a code, hands it over and closes; the camera stops on close.
 */
export default function ScanDialog({
  title,
  cancelLabel,
  formats,
  onCode,
  onClose,
}: ScanDialogProps) {
  const theme = useTheme();
  const phone = useMediaQuery(theme.breakpoints.down('sm'));
  const video = useRef<HTMLVideoElement>(null);
  const [state, setState] = useState<State>({ status: 'starting' });
  const done = useRef(onCode);
  done.current = onCode;

  useEffect(() => {
    let stopped = false;
    let stream: MediaStream | null = null;
    let timer: ReturnType<typeof setTimeout> | undefined;
    const start = async () => {
      if (!navigator.mediaDevices?.getUserMedia) {
        setState({
          status: 'error',
          message: 'This browser gives no camera to the page. Type the code instead.',
        });
        return;
      }
      try {
        stream = await navigator.mediaDevices.getUserMedia({
          audio: false,
          video: { facingMode: { ideal: 'environment' }, width: { ideal: 1280 } },
        });
      } catch (error) {
        if (!stopped) setState({ status: 'error', message: cameraError(error) });
        return;
      }
      if (stopped || !video.current) {
        stream.getTracks().forEach((t) => t.stop());
        return;
      }
      video.current.srcObject = stream;
      await video.current.play().catch(() => undefined);
      let reader: CodeReader;
      try {
        reader = await createCodeReader(formats);
      } catch (error) {
        if (!stopped)
          setState({
            status: 'error',
            message: `The code reader did not load${error instanceof Error ? `: ${error.message}` : ''}. Type the code instead.`,
          });
        return;
      }
      if (stopped) return;
      setState({ status: 'looking', kind: reader.kind });
      const look = async () => {
        if (stopped || !video.current) return;
        if (video.current.readyState >= 2) {
          try {
            const codes = await reader.detect(video.current);
            const code = codes.find((c) => c.rawValue.trim() !== '');
            if (code && !stopped) {
              stopped = true;
              done.current({ text: code.rawValue, format: code.format });
              return;
            }
          } catch {
            // A frame the reader could not take (camera still warming up): try the next.
          }
        }
        if (!stopped) timer = setTimeout(() => void look(), FRAME_MS);
      };
      void look();
    };
    void start();
    return () => {
      stopped = true;
      clearTimeout(timer);
      stream?.getTracks().forEach((t) => t.stop());
    };
  }, [formats]);

  const names = formats.map((f) => FORMAT_LABELS[f] ?? f).join(', ');
  return (
    <Dialog
      open
      onClose={onClose}
      fullScreen={phone}
      fullWidth
      maxWidth="sm"
      aria-labelledby="scan-title"
    >
      <DialogTitle id="scan-title">{title}</DialogTitle>
      <DialogContent>
        {state.status === 'error' ? (
          <Alert severity="warning" role="alert">
            {state.message}
          </Alert>
        ) : (
          <>
            <Box
              sx={{
                position: 'relative',
                bgcolor: 'grey.900',
                borderRadius: 1,
                overflow: 'hidden',
                aspectRatio: '4 / 3',
              }}
            >
              <video
                ref={video}
                muted
                playsInline
                aria-label="Camera"
                style={{ width: '100%', height: '100%', objectFit: 'cover', display: 'block' }}
              />
              <Box
                aria-hidden
                sx={{
                  position: 'absolute',
                  inset: '18% 12%',
                  border: '3px solid',
                  borderColor: 'common.white',
                  borderRadius: 1,
                  boxShadow: '0 0 0 2000px rgba(0,0,0,0.25)',
                }}
              />
            </Box>
            <Typography role="status" sx={{ mt: 1.5 }}>
              {state.status === 'starting'
                ? 'Starting the camera…'
                : 'Hold the code inside the frame; it is read by itself.'}
            </Typography>
            <Typography variant="body2" color="text.secondary">
              Reads {names}.
            </Typography>
          </>
        )}
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose} size="large">
          {cancelLabel}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
