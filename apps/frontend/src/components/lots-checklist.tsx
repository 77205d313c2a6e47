import {
  Alert,
  Checkbox,
  FormControlLabel,
  FormGroup,
  FormHelperText,
  Skeleton,
  Typography,
} from '@mui/material';
import { errorMessage } from '@/lib/query-client';

/**
 * A supplier's lots to tick for a request about them (a return, a SCAR): what to do before
 * a supplier is chosen, loading, a load error, none to choose, or one checkbox a lot.
 */
export function LotsChecklist<L extends { id: number }>({
  supplierId,
  query,
  lots,
  describe,
  words,
  scroll = false,
  value,
  onChange,
  error,
}: {
  supplierId: number | null;
  query: { isPending: boolean; isError: boolean; error: unknown };
  /** Undefined until they have come. */
  lots: readonly L[] | undefined;
  /** The checkbox's words for a lot. */
  describe: (lot: L) => string;
  words: {
    /** The list's title, also its accessible name unless `listLabel`. */
    title: string;
    listLabel?: string;
    /** "Choose the supplier to see its lots." */
    noSupplier: string;
    loading: string;
    /** "The lots could not be loaded". */
    loadFailed: string;
    none: string;
  };
  /** Keep a long list to a scrolling box. */
  scroll?: boolean;
  value: number[];
  onChange: (lotIds: number[]) => void;
  error?: string;
}) {
  if (supplierId === null)
    return <Typography color="text.secondary">{words.noSupplier}</Typography>;
  if (query.isPending) return <Skeleton variant="rounded" height={64} aria-label={words.loading} />;
  if (query.isError || !lots) {
    return (
      <Alert severity="error">
        {words.loadFailed}: {errorMessage(query.error)}
      </Alert>
    );
  }
  if (lots.length === 0) return <Typography color="text.secondary">{words.none}</Typography>;
  const toggle = (id: number, on: boolean) =>
    onChange(on ? [...value, id] : value.filter((v) => v !== id));
  return (
    <div>
      <Typography variant="subtitle2">{words.title}</Typography>
      <FormGroup
        aria-label={words.listLabel ?? words.title}
        sx={scroll ? { maxHeight: 220, overflowY: 'auto', flexWrap: 'nowrap' } : undefined}
      >
        {lots.map((lot) => (
          <FormControlLabel
            key={lot.id}
            control={
              <Checkbox
                checked={value.includes(lot.id)}
                onChange={(e) => toggle(lot.id, e.target.checked)}
              />
            }
            label={describe(lot)}
          />
        ))}
      </FormGroup>
      {error && <FormHelperText error>{error}</FormHelperText>}
    </div>
  );
}
