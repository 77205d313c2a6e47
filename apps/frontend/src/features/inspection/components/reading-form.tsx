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
  // A stranded conductor's overall diameter is not its metal: no diameter tab (issue 13).
  const stranded = (props.conductor.claimedStrands ?? 1) > 1;
  const methods = METHOD_ORDER.filter((m) => !(stranded && m === 'diameter'));
  const [method, setMethod] = useState<ReadingMethod>(
    methods.includes(defaultMethod) ? defaultMethod : 'mass',
  );
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
        {methods.map((m) => (
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
