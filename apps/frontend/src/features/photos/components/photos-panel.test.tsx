import { ThemeProvider } from '@mui/material/styles';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { theme } from '@/app/theme';
import { PhotosPanel } from '@/features/photos/components/photos-panel';

function renderPanel(props: { canUpload: boolean; frozen?: boolean }) {
  render(
    <ThemeProvider theme={theme}>
      <QueryClientProvider client={new QueryClient()}>
        <PhotosPanel lotId={3} photos={[]} samples={[]} {...props} />
      </QueryClientProvider>
    </ThemeProvider>,
  );
}

describe('PhotosPanel without photos', () => {
  it('asks for the photos while the lot is open to them', () => {
    renderPanel({ canUpload: true });
    expect(
      screen.getByText('No photos yet. Photograph the label, the reel and each stripped sample.'),
    ).toBeInTheDocument();
  });

  it('says plainly that none was taken once the lot went back, and asks for none', () => {
    renderPanel({ canUpload: false, frozen: true });
    expect(
      screen.getByText(
        'No photo was taken before this lot was returned. Its evidence stays as the supplier received it.',
      ),
    ).toBeInTheDocument();
    expect(screen.queryByText(/Photograph the label/)).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /photo/i })).not.toBeInTheDocument();
  });
});
