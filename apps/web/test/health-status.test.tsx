import { cleanup, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { HealthStatus } from '../src/components/HealthStatus';
import { always, json, renderWithClient, stubFetch } from './support/render-page';

function renderWithAnswer(status: number, body: unknown) {
  stubFetch(always(() => json(status, body)));
  renderWithClient(<HealthStatus />);
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('HealthStatus', () => {
  it('says the database is reachable when the server answers ok', async () => {
    renderWithAnswer(200, { status: 'ok', db: 'ok', version: '0.1.0' });
    expect(await screen.findByText(/database reachable/)).toBeTruthy();
  });

  it('shows the reason from a 503 answer', async () => {
    renderWithAnswer(503, { status: 'degraded', db: 'down', reason: 'database unreachable: connection refused', version: '0.1.0' });
    expect(await screen.findByText('Server up · database unreachable', { exact: false })).toBeTruthy();
    expect(screen.getByText('database unreachable: connection refused')).toBeTruthy();
  });

  it('says the server is unreachable when the answer is not a health report', async () => {
    renderWithAnswer(502, { nonsense: true });
    expect(await screen.findByText(/Server unreachable/)).toBeTruthy();
  });
});
