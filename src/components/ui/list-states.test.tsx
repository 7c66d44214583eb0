import { Ticket } from 'lucide-react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { ListStates } from '@/components/ui/list-states';

const html = (state: { count: number; isLoading?: boolean; error?: unknown }) =>
  renderToStaticMarkup(
    <ListStates
      noun="tickets"
      icon={Ticket}
      count={state.count}
      isLoading={state.isLoading ?? false}
      error={state.error ?? null}
      onRetry={() => {}}
      empty={{ title: 'Nothing open' }}
    >
      <ul aria-label="Tickets" />
    </ListStates>,
  );

describe('a card list’s first load', () => {
  it('says what failed, with a way to try again, before anything is loaded', () => {
    const out = html({ count: 0, isLoading: true, error: new Error('offline') });
    expect(out).toContain('The tickets could not be loaded.');
    expect(out).toMatch(/<button[^>]*>.*Try again.*<\/button>/);
    expect(out).not.toContain('Loading tickets');
  });

  it('says it is loading, then that the list is empty', () => {
    expect(html({ count: 0, isLoading: true })).toContain('Loading tickets…');
    const empty = html({ count: 0 });
    expect(empty).toContain('Nothing open');
    expect(empty).not.toContain('aria-label="Tickets"');
  });

  it('keeps the list it has when a later page fails or loads', () => {
    const out = html({ count: 3, isLoading: true, error: new Error('offline') });
    expect(out).toContain('aria-label="Tickets"');
    expect(out).not.toContain('could not be loaded');
    expect(out).not.toContain('Loading');
  });
});
