import { Tab, Tabs } from '@mui/material';
import { useState } from 'react';
import { MethodReadingForm } from '@/features/inspection/components/method-reading-form';
import { METHOD_ORDER, METHODS } from '@/features/inspection/lib/reading-methods';
import type { Conductor, Instrument, ReadingMethod } from '@/features/inspection/types';

interface ReadingFormProps {
  sampleId: number;
  conductor: Conductor;
  minAreaRatio: number;
  instruments: readonly Instrument[];
}

/** One form per method; a second method on the same sample helps identify the metal. */
export function ReadingForm(props: ReadingFormProps) {
  const [method, setMethod] = useState<ReadingMethod>('mass');
  return (
    <div>
      <Tabs
        value={method}
        onChange={(_e, next: ReadingMethod) => setMethod(next)}
        aria-label="Reading method"
        sx={{ mb: 2 }}
      >
        {METHOD_ORDER.map((m) => (
          <Tab key={m} value={m} label={METHODS[m].label} />
        ))}
      </Tabs>
      <MethodReadingForm
        key={`${props.sampleId}-${method}`}
        definition={METHODS[method]}
        {...props}
      />
    </div>
  );
}
