import { ChangePasswordRequestSchema } from '@benchproof/contracts';
import { MantineProvider } from '@mantine/core';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import { theme } from '../../../app/theme';
import { handleSessionLost } from '../../../lib/api-client';
import { ChangePasswordForm } from './change-password-form';

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

function renderForm() {
  const qc = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  render(
    <QueryClientProvider client={qc}>
      <MantineProvider theme={theme}>
        <ChangePasswordForm />
      </MantineProvider>
    </QueryClientProvider>,
  );
}

/** The error Mantine shows under a box: the `…-error` element its input names in aria-describedby. */
function messageUnder(label: string): string | null {
  const input = screen.getByLabelText(label, { selector: 'input' });
  const ids = (input.getAttribute('aria-describedby') ?? '').split(' ').filter((id) => id.endsWith('-error'));
  return ids.map((id) => document.getElementById(id)?.textContent ?? '').find((t) => t.length > 0) ?? null;
}

function fillAndSubmit(current: string, next: string) {
  fireEvent.change(screen.getByLabelText('Current password', { selector: 'input' }), { target: { value: current } });
  fireEvent.change(screen.getByLabelText('New password', { selector: 'input' }), { target: { value: next } });
  fireEvent.click(screen.getByRole('button', { name: 'Change password' }));
}

describe('change password form', () => {
  const fetchSpy = vi.fn<typeof fetch>();
  const sessionLost = vi.fn();
  beforeEach(() => {
    fetchSpy.mockReset();
    sessionLost.mockReset();
    vi.stubGlobal('fetch', fetchSpy);
    handleSessionLost(sessionLost);
  });
  afterEach(() => vi.unstubAllGlobals());

  it('shows a wrong current password under that box and keeps this device signed in', async () => {
    fetchSpy.mockResolvedValue(
      json(401, { code: 'INVALID_CREDENTIALS', message: 'The current password is not right.', details: { field: 'currentPassword' } }),
    );
    renderForm();
    fillAndSubmit('not-my-password', 'a-long-new-password');
    await waitFor(() => expect(messageUnder('Current password')).toBe('The current password is not right.'));
    expect(messageUnder('New password')).toBeNull();
    expect(screen.queryByRole('alert')).toBeNull();
    expect(sessionLost).not.toHaveBeenCalled();
    const [url, init] = fetchSpy.mock.calls[0] ?? [];
    expect(url).toBe('/api/auth/password');
    expect(JSON.parse(init?.body as string)).toEqual({ currentPassword: 'not-my-password', newPassword: 'a-long-new-password' });
  });

  it('refuses a short new password with the contract message before sending', async () => {
    renderForm();
    fillAndSubmit('old-password-123', 'short');
    const expected = ChangePasswordRequestSchema.shape.newPassword.safeParse('short').error?.issues[0]?.message;
    await waitFor(() => expect(messageUnder('New password')).toBe(expected));
    expect(fetchSpy).not.toHaveBeenCalled();
  });

  it('says the other devices were signed out after a change', async () => {
    const user = { id: 3, shopId: 1, email: 'desk@example.test', name: 'Desk', role: 'desk' };
    fetchSpy.mockResolvedValue(json(200, { user, expiresAt: '2026-12-02T14:00:00.000Z', csrfToken: 'fresh' }));
    renderForm();
    fillAndSubmit('old-password-123', 'a-long-new-password');
    expect(await screen.findByText(/Every other device signed in as you has been signed out/)).toBeTruthy();
  });
});
