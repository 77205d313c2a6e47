import { Card, CardContent, Stack, Tab, Tabs, Typography } from '@mui/material';
import { useState, type ReactNode } from 'react';
import { AreaFromMassCalculator } from '@/features/reference/components/area-from-mass-calculator';
import { AreaFromResistanceCalculator } from '@/features/reference/components/area-from-resistance-calculator';
import { AreaFromStrandsCalculator } from '@/features/reference/components/area-from-strands-calculator';
import { AwgTable, MetricTable } from '@/features/reference/components/gauge-tables';
import { InstallerCautions } from '@/features/reference/components/installer-cautions';
import { VoltageDropCalculator } from '@/features/reference/components/voltage-drop-calculator';

function Section({
  title,
  intro,
  children,
}: {
  title: string;
  intro?: string;
  children: ReactNode;
}) {
  return (
    <Card variant="outlined">
      <CardContent>
        <Typography variant="h4" component="h2" gutterBottom>
          {title}
        </Typography>
        {intro && (
          <Typography variant="body2" color="text.secondary" sx={{ mb: 2 }}>
            {intro}
          </Typography>
        )}
        {children}
      </CardContent>
    </Card>
  );
}

const calculators = [
  { id: 'mass', label: 'Area from mass', body: <AreaFromMassCalculator /> },
  { id: 'strands', label: 'Area from strands', body: <AreaFromStrandsCalculator /> },
  { id: 'resistance', label: 'Area from resistance', body: <AreaFromResistanceCalculator /> },
] as const;

export function ReferencePanel() {
  const [tab, setTab] = useState(0);
  const [table, setTable] = useState(0);
  return (
    <Stack spacing={3}>
      <InstallerCautions />
      <Section
        title="Voltage drop of a run"
        intro="Resistance per metre from the conductor's resistivity and area, times the whole circuit: power plus ground. Results update as you type."
      >
        <VoltageDropCalculator />
      </Section>
      <Section
        title="Cross-section from readings"
        intro="The same computation the server runs on a reading; here as a preview only."
      >
        <Tabs
          value={tab}
          onChange={(_e, v: number) => setTab(v)}
          aria-label="Area calculators"
          sx={{ mb: 2 }}
        >
          {calculators.map((c) => (
            <Tab key={c.id} label={c.label} />
          ))}
        </Tabs>
        {calculators[tab].body}
      </Section>
      <Section title="Gauge tables">
        <Tabs
          value={table}
          onChange={(_e, v: number) => setTable(v)}
          aria-label="Gauge tables"
          sx={{ mb: 2 }}
        >
          <Tab label="AWG (ASTM B258)" />
          <Tab label="Metric (IEC 60228)" />
        </Tabs>
        {table === 0 ? <AwgTable /> : <MetricTable />}
      </Section>
    </Stack>
  );
}
