import QrCodeScannerOutlined from '@mui/icons-material/QrCodeScannerOutlined';
import { IconButton, Tooltip } from '@mui/material';
import { lazy, Suspense, useState, type ReactNode } from 'react';
import { DOCK_FORMATS, type DockFormat, type ScannedCode } from './scan-codes';

// The camera, the dialog and the decoder load on the first tap, never with the screen.
const ScanDialog = lazy(() => import('./scan-dialog'));

export interface ScanButtonProps {
  /** Accessible name and tooltip, e.g. "Scan the PO number". */
  label: string;
  onCode: (code: ScannedCode) => void;
  formats?: readonly DockFormat[];
  /** Drawn instead of the icon button, given the function that opens the camera. */
  render?: (open: () => void) => ReactNode;
  color?: 'inherit' | 'default' | 'primary';
  cancelLabel?: string;
}

/** A camera button that reads a barcode or QR code and hands its text over. */
export function ScanButton({
  label,
  onCode,
  formats = DOCK_FORMATS,
  render,
  color,
  cancelLabel = 'Type it instead',
}: ScanButtonProps) {
  const [open, setOpen] = useState(false);
  const show = () => setOpen(true);
  return (
    <>
      {render ? (
        render(show)
      ) : (
        <Tooltip title={label}>
          <IconButton aria-label={label} onClick={show} edge="end" color={color}>
            <QrCodeScannerOutlined />
          </IconButton>
        </Tooltip>
      )}
      {open && (
        <Suspense fallback={null}>
          <ScanDialog
            title={label}
            cancelLabel={cancelLabel}
            formats={formats}
            onClose={() => setOpen(false)}
            onCode={(code) => {
              setOpen(false);
              onCode(code);
            }}
          />
        </Suspense>
      )}
    </>
  );
}
