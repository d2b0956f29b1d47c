import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderApp } from '@/testing/test-utils';

describe('routes', () => {
  it('shows the not-found page, naming the path, for an unknown URL', async () => {
    renderApp('/no/such/page');
    expect(await screen.findByRole('heading', { name: 'Page not found' })).toBeInTheDocument();
    expect(screen.getByText('/no/such/page')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: /back to the workbench/i })).toHaveAttribute(
      'href',
      '/',
    );
  });

  it('shows the sign-in form with labelled fields', async () => {
    renderApp('/sign-in');
    // The route loads lazily: on a busy machine its first import can take seconds.
    expect(
      await screen.findByRole('heading', { name: 'Sign in' }, { timeout: 15_000 }),
    ).toBeInTheDocument();
    expect(screen.getByLabelText('E-mail')).toBeInTheDocument();
    expect(screen.getByLabelText('Password')).toBeInTheDocument();
  });
});
