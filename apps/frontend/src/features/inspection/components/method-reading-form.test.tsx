import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { MethodReadingForm } from '@/features/inspection/components/method-reading-form';
import { METHODS } from '@/features/inspection/lib/reading-methods';
import type { Conductor, Instrument } from '@/features/inspection/types';
import { UnitsProvider } from '@/lib/units';

const fetchMock = vi.fn<typeof fetch>();
vi.stubGlobal('fetch', fetchMock);
afterEach(() => fetchMock.mockReset());

const conductor: Conductor = {
  id: 3,
  position: 1,
  purpose: 'power',
  gauge: '4 AWG',
  gaugeSystem: 'awg',
  nominalAreaMm2: 21.15,
  claimedMaterial: 'copper',
  claimedStrands: null,
  conductorClass: null,
  active: true,
};
const instrument = (over: Partial<Instrument>): Instrument => ({
  id: 1,
  kind: 'balance',
  name: 'Bench balance',
  serial: 'BB-01',
  resolution: 0.1,
  resolutionUnit: 'g',
  calibratedOn: '2026-01-10',
  calibrationDueOn: '2027-01-10',
  active: true,
  calibrationStatus: 'ok',
  daysToDue: 100,
  accuracyPercentOfReading: null,
  accuracyAbsolute: null,
  calibrationUncertainty: null,
  version: 1,
  createdAt: '2026-01-10T08:00:00.000Z',
  updatedAt: '2026-01-10T08:00:00.000Z',
  ...over,
});
const instruments = [
  instrument({}),
  instrument({
    id: 2,
    name: 'Old balance',
    serial: 'OB-9',
    calibrationStatus: 'overdue',
    calibrationDueOn: '2026-01-01',
    daysToDue: -30,
  }),
];

function renderForm() {
  const client = new QueryClient({ defaultOptions: { mutations: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <UnitsProvider>
        <MethodReadingForm
          definition={METHODS.mass}
          sampleId={11}
          conductor={conductor}
          minAreaRatio={0.98}
          instruments={instruments}
        />
      </UnitsProvider>
    </QueryClientProvider>,
  );
  return userEvent.setup();
}

describe('MethodReadingForm (mass)', { timeout: 30_000 }, () => {
  it('shows the live result while typing: 76.1 g over 1000 mm of a 4 AWG copper label measures as 8 AWG', async () => {
    const user = renderForm();
    await user.type(screen.getByLabelText(/Mass of the strands/), '76.1');
    await user.type(screen.getByLabelText(/Cut length/), '1000');
    const live = screen.getByRole('status', { name: 'Live result' });
    expect(within(live).getByText('Preview — the server recomputes')).toBeInTheDocument();
    expect(within(live).getByText(/Measures as 8 AWG/)).toBeInTheDocument();
    expect(within(live).getByText('Nonconforming')).toBeInTheDocument();
    expect(
      within(live).getByText(
        /8\.39\d* ± [\d.]+ mm² \(k = 2\): 39\.7 % of the 4 AWG nominal 21\.15 mm²/,
      ),
    ).toBeInTheDocument();
    expect(screen.getByRole('alert', { name: 'Caution for Power 4 AWG' })).toHaveTextContent(
      'a fuse sized for the label may not protect it',
    );
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('validates as the clerk types and sends nothing without a balance', async () => {
    const user = renderForm();
    await user.type(screen.getByLabelText(/Mass of the strands/), '0');
    expect(await screen.findByText('Must be greater than 0.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Record mass reading' }));
    expect(await screen.findByText('Choose the balance you used.')).toBeInTheDocument();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('offers an overdue balance only as a disabled choice with its due date', async () => {
    const user = renderForm();
    await user.click(screen.getByRole('combobox', { name: /Balance/ }));
    const overdue = await screen.findByRole('option', { name: /Old balance/ });
    expect(overdue).toHaveAttribute('aria-disabled', 'true');
    expect(overdue).toHaveTextContent('Calibration overdue since 2026-01-01');
  });

  it('sends the reading and puts the server’s refusal above the form', async () => {
    fetchMock.mockResolvedValueOnce(
      new Response(
        JSON.stringify({
          statusCode: 422,
          error: 'x',
          message: 'Bench balance (BB-01) was due for calibration on 2026-01-10.',
          path: '/',
          requestId: 'r',
        }),
        { status: 422, headers: { 'Content-Type': 'application/json' } },
      ),
    );
    const user = renderForm();
    await user.type(screen.getByLabelText(/Mass of the strands/), '76.1');
    await user.type(screen.getByLabelText(/Cut length/), '1000');
    await user.click(screen.getByRole('combobox', { name: /Balance/ }));
    await user.click(await screen.findByRole('option', { name: /Bench balance/ }));
    await user.click(screen.getByRole('button', { name: 'Record mass reading' }));
    expect(await screen.findByText(/was due for calibration on 2026-01-10/)).toBeInTheDocument();
    const [url, init] = fetchMock.mock.calls[0] ?? [];
    expect(url).toBe('/api/samples/11/readings');
    expect(JSON.parse(String(init?.body))).toEqual({
      method: 'mass',
      massG: 76.1,
      lengthMm: 1000,
      instrumentIds: [1],
    });
  });
});
