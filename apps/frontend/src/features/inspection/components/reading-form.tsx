import { Tab, Tabs } from '@mui/material';
import { useState } from 'react';
import {
  MethodReadingForm,
  type MethodReadingFormProps,
} from '@/features/inspection/components/method-reading-form';
import { METHOD_ORDER, METHODS } from '@/features/inspection/lib/reading-methods';
import type { ReadingMethod } from '@/features/inspection/types';

type ReadingFormProps = Omit<MethodReadingFormProps, 'definition'> & {
  /** The tab to open on (bench mode: the method the conductor prefers). */
  defaultMethod?: ReadingMethod;
};

/** One form per method; a second method on the same sample helps identify the metal. */
export function ReadingForm({ defaultMethod = 'mass', ...props }: ReadingFormProps) {
  const [method, setMethod] = useState<ReadingMethod>(defaultMethod);
  return (
    <div>
      <Tabs
        value={method}
        onChange={(_e, next: ReadingMethod) => setMethod(next)}
        aria-label="Reading method"
        variant="scrollable"
        allowScrollButtonsMobile
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
