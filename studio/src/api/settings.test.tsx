import type { ReactNode } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { QueryClientProvider } from '@tanstack/react-query';
import { renderHook } from '@testing-library/react';
import { createQueryClient } from '../app/query-client';
import { useSaveSetting } from './settings';

function serve(): Request[] {
  const sent: Request[] = [];
  vi.stubGlobal('fetch', vi.fn(async (request: Request) => {
    sent.push(request);
    return new Response(JSON.stringify({ id: 5, venueId: 2, name: 'East Hall' }), { headers: { 'Content-Type': 'application/json' } });
  }));
  return sent;
}

const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={createQueryClient()}>{children}</QueryClientProvider>;

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('saving a settings row', () => {
  it('creates a gallery in the venue chosen', async () => {
    const sent = serve();
    const { result } = renderHook(() => useSaveSetting('galleries'), { wrapper });
    await result.current.mutateAsync({ fields: { venueId: 2, name: 'East Hall' } });
    expect(sent[0]!.method).toBe('POST');
    expect(new URL(sent[0]!.url).pathname).toBe('/api/galleries');
    expect(await sent[0]!.json()).toEqual({ venueId: 2, name: 'East Hall' });
  });

  // The server's UpdateGalleryDto takes no venueId and refuses a field it does not know (400).
  it('changes a gallery without sending its venue, which a change cannot move', async () => {
    const sent = serve();
    const { result } = renderHook(() => useSaveSetting('galleries'), { wrapper });
    await result.current.mutateAsync({ id: 5, fields: { venueId: 2, name: 'East Hall' } });
    expect(sent[0]!.method).toBe('PATCH');
    expect(new URL(sent[0]!.url).pathname).toBe('/api/galleries/5');
    expect(await sent[0]!.json()).toEqual({ name: 'East Hall' });
  });
});
