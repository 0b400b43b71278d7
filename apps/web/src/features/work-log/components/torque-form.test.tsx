import { TorqueEntryRequestSchema } from '@benchproof/contracts';
import { MantineProvider } from '@mantine/core';
import { DatesProvider } from '@mantine/dates';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import { theme } from '../../../app/theme';
import { TorqueForm } from './torque-form';

function renderForm() {
  const qc = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  return render(
    <QueryClientProvider client={qc}>
      <MantineProvider theme={theme}>
        <DatesProvider settings={{}}>
          <TorqueForm jobId={7} />
        </DatesProvider>
      </MantineProvider>
    </QueryClientProvider>,
  );
}

/** The error Mantine shows under a box: the `…-error` element its input names in aria-describedby. */
function messageUnder(label: string): string | null {
  const input = screen.getByLabelText(label, { exact: false, selector: 'input' });
  const ids = (input.getAttribute('aria-describedby') ?? '').split(' ').filter((id) => id.endsWith('-error'));
  return ids.map((id) => document.getElementById(id)?.textContent ?? '').find((t) => t.length > 0) ?? null;
}

describe('torque form: the contract schema through the form resolver', () => {
  const fetchSpy = vi.fn();
  beforeEach(() => {
    fetchSpy.mockReset();
    vi.stubGlobal('fetch', fetchSpy);
  });
  afterEach(() => vi.unstubAllGlobals());

  it("puts the schema's own messages under the boxes that hold the bad values and sends nothing", async () => {
    renderForm();
    fireEvent.change(screen.getByLabelText('Fastener', { exact: false }), { target: { value: 'Stem steerer clamp bolts' } });
    fireEvent.change(screen.getByLabelText('Where the value comes from', { exact: false }), { target: { value: 'x' } });
    fireEvent.change(screen.getByLabelText('Applied'), { target: { value: '0' } });
    fireEvent.click(screen.getByRole('button', { name: 'Log torque' }));

    // The expected texts come from the same contract schema the API's pipe uses.
    const shortSource = TorqueEntryRequestSchema.shape.specSource.safeParse('x').error?.issues[0]?.message;
    const zeroApplied = TorqueEntryRequestSchema.shape.applied.safeParse({ value: 0, unit: 'nm' }).error?.issues[0]?.message;
    expect(shortSource).toBeTruthy();
    await waitFor(() => expect(messageUnder('Where the value comes from')).toBe(shortSource));
    // applied.value in the request is the "Applied" box in the form.
    expect(messageUnder('Applied')).toBe(zeroApplied);
    expect(messageUnder('Fastener')).toBeNull();
    expect(fetchSpy).not.toHaveBeenCalled();
  });
});
