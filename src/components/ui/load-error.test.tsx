import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { LoadError } from '@/components/ui/load-error';

describe('what could not be loaded', () => {
  it('names it and says why, announced at once', () => {
    const out = renderToStaticMarkup(<LoadError title="The walls could not be loaded." error={new Error('offline')} />);
    expect(out).toContain('role="alert"');
    expect(out).toContain('The walls could not be loaded.');
  });

  it('offers a "Try again" button only where there is something to retry', () => {
    const error = new Error('offline');
    expect(renderToStaticMarkup(<LoadError title="The walls could not be loaded." error={error} />)).not.toContain('<button');
    expect(renderToStaticMarkup(<LoadError title="The walls could not be loaded." error={error} onRetry={() => {}} />)).toMatch(
      /<button[^>]*>.*Try again.*<\/button>/,
    );
  });
});
