import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, waitFor } from '@testing-library/react';

import { SignInForm } from '@/components/auth/sign-in-form';

function renderForm() {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <SignInForm />
    </QueryClientProvider>,
  );
}

function respond(status: number, body: unknown) {
  global.fetch = jest.fn().mockResolvedValue({ ok: status < 400, status, json: async () => body }) as jest.Mock;
}

describe('SignInForm', () => {
  it('asks for both fields before calling the server', async () => {
    respond(200, {});
    renderForm();
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter your e-mail address')).toBeInTheDocument();
    expect(screen.getByText('Enter your password')).toBeInTheDocument();
    expect(global.fetch).not.toHaveBeenCalled();
  });

  it('shows the server message when sign-in is refused', async () => {
    respond(401, { error: { code: 'sign_in_failed', message: 'That e-mail and password do not match an active account.' } });
    renderForm();
    fireEvent.change(screen.getByLabelText('E-mail'), { target: { value: 'tess@example.test' } });
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'wrong-password' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('That e-mail and password do not match an active account.')).toBeInTheDocument();
    const [url, init] = (global.fetch as jest.Mock).mock.calls[0];
    expect(url).toBe('/api/session');
    expect(init.headers['X-Sightline-Request']).toBe('1');
  });

  it('puts field errors from the server next to their fields', async () => {
    respond(400, {
      error: { code: 'invalid_input', message: 'Please correct: email.', fields: { email: 'Enter a valid e-mail address' } },
    });
    renderForm();
    fireEvent.change(screen.getByLabelText('E-mail'), { target: { value: 'a@b.cd' } });
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'x' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    await waitFor(() => expect(screen.getByText('Enter a valid e-mail address')).toBeInTheDocument());
  });
});
