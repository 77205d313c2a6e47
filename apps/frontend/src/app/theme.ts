import { createTheme } from '@mui/material/styles';

// Gaugeproof's own look: deep teal for structure, copper for emphasis, and loud,
// unmistakable warning and error colours because those carry safety messages.
const ink = '#12343b';
const copper = '#b8642b';

export const theme = createTheme({
  palette: {
    mode: 'light',
    primary: { main: '#0f5c63', dark: '#0a3f45', light: '#3f8a90', contrastText: '#ffffff' },
    secondary: { main: copper, dark: '#8a4519', light: '#d58b57', contrastText: '#ffffff' },
    error: { main: '#b3261e', dark: '#8c1d18', light: '#e46962', contrastText: '#ffffff' },
    warning: { main: '#b45309', dark: '#8a3f06', light: '#f0a04b', contrastText: '#ffffff' },
    success: { main: '#2e7d4f', dark: '#1f5a38', light: '#5fa97c', contrastText: '#ffffff' },
    info: { main: '#1d5f8a', contrastText: '#ffffff' },
    background: { default: '#f3f1ed', paper: '#ffffff' },
    text: { primary: '#1c2527', secondary: '#4f5d60' },
    divider: '#d9d4cc',
  },
  shape: { borderRadius: 6 },
  typography: {
    fontFamily: 'Roboto, system-ui, sans-serif',
    // A compact scale: these are work screens read at a bench, not marketing pages.
    h1: { fontSize: '2rem', fontWeight: 700, letterSpacing: '-0.01em' },
    h2: { fontSize: '1.625rem', fontWeight: 700 },
    h3: { fontSize: '1.375rem', fontWeight: 600 },
    h4: { fontSize: '1.25rem', fontWeight: 600 },
    h5: { fontSize: '1.125rem', fontWeight: 600 },
    h6: { fontSize: '1rem', fontWeight: 600 },
    subtitle1: { fontSize: '1rem', fontWeight: 500 },
    subtitle2: { fontSize: '0.875rem', fontWeight: 500 },
    body1: { fontSize: '0.9375rem', lineHeight: 1.55 },
    body2: { fontSize: '0.875rem', lineHeight: 1.5 },
    button: { textTransform: 'none', fontWeight: 600, letterSpacing: '0.01em' },
    overline: { fontWeight: 700, letterSpacing: '0.12em' },
  },
  components: {
    MuiAppBar: {
      defaultProps: { elevation: 0 },
      // Papers are outlined by default; the bar keeps only its copper rule.
      styleOverrides: {
        root: { backgroundColor: ink, border: 'none', borderBottom: `3px solid ${copper}` },
      },
    },
    MuiButton: { defaultProps: { disableElevation: true } },
    MuiPaper: { defaultProps: { variant: 'outlined' } },
    MuiTextField: { defaultProps: { fullWidth: true, margin: 'normal' } },
    MuiTableCell: {
      styleOverrides: { head: { fontWeight: 700, backgroundColor: '#ebe7e0' } },
    },
    MuiAlert: {
      styleOverrides: {
        root: {
          alignItems: 'flex-start',
          // Safety messages get a hard edge so they read as more than a tint.
          variants: [
            {
              props: { variant: 'standard', severity: 'warning' },
              style: { borderLeft: '4px solid #b45309' },
            },
            {
              props: { variant: 'standard', severity: 'error' },
              style: { borderLeft: '4px solid #b3261e' },
            },
          ],
        },
      },
    },
  },
});

export const shellColors = { ink, copper };
