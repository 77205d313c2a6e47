import PrintOutlined from '@mui/icons-material/PrintOutlined';
import { Button } from '@mui/material';

/** Opens the lot's printable hold / reject tag (PDF with a QR code) in a new tab. */
export function PrintTagButton({ lotId }: { lotId: number }) {
  return (
    <Button
      variant="outlined"
      startIcon={<PrintOutlined />}
      href={`/api/lots/${lotId}/tag.pdf`}
      target="_blank"
      rel="noopener"
    >
      Print tag
    </Button>
  );
}
