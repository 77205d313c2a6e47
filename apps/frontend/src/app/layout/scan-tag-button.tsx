import { useNavigate } from 'react-router';
import { ScanButton } from '@/components/scanner/scan-button';
import { lotOfTag } from '@/components/scanner/scan-codes';
import { paths } from '@/config/paths';
import { toasts } from '@/lib/toast-store';

/**
 * Scans one of our own tags anywhere in the app: a held lot's tag opens bench mode, a
 * decided lot's its page. Any other code is named and left alone.
 */
export function ScanTagButton() {
  const navigate = useNavigate();
  return (
    <ScanButton
      label="Scan a lot tag"
      color="inherit"
      cancelLabel="Cancel"
      formats={['qr_code']}
      onCode={({ text }) => {
        const tag = lotOfTag(text, window.location.origin);
        if (!tag) {
          toasts.show(`That code is not one of our lot tags: “${text.slice(0, 80)}”.`, 'warning');
          return;
        }
        void navigate(tag.bench ? paths.lotBench.getHref(tag.lotId) : paths.lot.getHref(tag.lotId));
      }}
    />
  );
}
