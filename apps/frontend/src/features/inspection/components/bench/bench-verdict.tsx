import CheckCircleOutlined from '@mui/icons-material/CheckCircleOutlined';
import CloudOffOutlined from '@mui/icons-material/CloudOffOutlined';
import HelpOutlineOutlined from '@mui/icons-material/HelpOutlineOutlined';
import HighlightOffOutlined from '@mui/icons-material/HighlightOffOutlined';
import { Box, Stack, Typography } from '@mui/material';
import { verdictLabels } from '@/features/inspection/lib/labels';
import type { Reading, ReadingVerdict } from '@/features/inspection/types';

const look: Record<
  ReadingVerdict,
  { bg: string; fg: string; Icon: typeof CheckCircleOutlined; says: string }
> = {
  conforms: {
    bg: 'success.main',
    fg: 'success.contrastText',
    Icon: CheckCircleOutlined,
    says: 'This piece has the copper its label promises.',
  },
  nonconforming: {
    bg: 'error.main',
    fg: 'error.contrastText',
    Icon: HighlightOffOutlined,
    says: 'This piece is short of what its label promises. Keep it with the lot as evidence.',
  },
  inconclusive: {
    bg: 'warning.main',
    fg: 'warning.contrastText',
    Icon: HelpOutlineOutlined,
    says: 'Too close to the limit to say. Take another reading or another method.',
  },
};

/** The result of the piece just recorded, large and in words as well as colour. */
export function BenchVerdict({ reading, label }: { reading: Reading | null; label: string }) {
  if (reading === null) {
    return (
      <Box
        role="status"
        aria-label={`${label}: waiting to send`}
        sx={{ p: 2, borderRadius: 2, bgcolor: 'grey.300', color: 'text.primary' }}
      >
        <Stack direction="row" spacing={2} sx={{ alignItems: 'center' }}>
          <CloudOffOutlined sx={{ fontSize: 48 }} />
          <div>
            <Typography variant="h4" component="p" sx={{ fontWeight: 700 }}>
              Waiting to send
            </Typography>
            <Typography>
              {label} is kept on this device and sent when the network is back; its verdict comes
              then.
            </Typography>
          </div>
        </Stack>
      </Box>
    );
  }
  const { bg, fg, Icon, says } = look[reading.verdict];
  return (
    <Box
      role="status"
      aria-label={`${label}: ${verdictLabels[reading.verdict]}`}
      data-verdict={reading.verdict}
      sx={{ p: 2, borderRadius: 2, bgcolor: bg, color: fg }}
    >
      <Stack direction="row" spacing={2} sx={{ alignItems: 'center' }}>
        <Icon sx={{ fontSize: 56 }} />
        <div>
          <Typography variant="h3" component="p" sx={{ fontWeight: 800, lineHeight: 1.1 }}>
            {verdictLabels[reading.verdict]}
          </Typography>
          <Typography variant="h6" component="p">
            {label} measures as {reading.measuresAs}
          </Typography>
        </div>
      </Stack>
      <Typography sx={{ mt: 1 }}>{says}</Typography>
      {reading.reasons.map((reason) => (
        <Typography key={reason} variant="body2">
          {reason}
        </Typography>
      ))}
    </Box>
  );
}
