import { describe, expect, it } from 'vitest';
import { closeForm, type CloseForm } from '@/features/visits/utils/close-form';

// A 1 × 1 PNG (signature, IHDR, IDAT and IEND chunks, RFC 2083) as the pad exports it: a data URL.
const drawing = 'data:image/png;base64,iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==';

const form = (change: Partial<CloseForm>): CloseForm => ({
  summary: 'Replaced one module.',
  checklist: [{ label: 'Client shown the result', done: true }],
  noSigner: false,
  signedByName: '',
  signature: '',
  unsignedReason: '',
  ...change,
});

const problems = (values: CloseForm) => {
  const result = closeForm.safeParse(values);
  return result.success ? {} : Object.fromEntries(result.error.issues.map((i) => [i.path.join('.'), i.message]));
};

describe('the close form', () => {
  it('sends the drawing and the name, and nothing about not signing', () => {
    expect(closeForm.parse(form({ signature: drawing, signedByName: 'Tobin Ashgrove', unsignedReason: 'typed earlier' }))).toEqual({
      summary: 'Replaced one module.',
      checklist: [{ label: 'Client shown the result', done: true }],
      signedByName: 'Tobin Ashgrove',
      signature: drawing,
    });
  });

  it('"No one could sign" sends the reason only, even with a drawing left on the pad', () => {
    expect(
      closeForm.parse(form({ noSigner: true, signature: drawing, signedByName: 'X', unsignedReason: 'No one on site after hours' })),
    ).toEqual({
      summary: 'Replaced one module.',
      checklist: [{ label: 'Client shown the result', done: true }],
      unsignedReason: 'No one on site after hours',
    });
  });

  it('puts each missing thing on its own field, in the server’s words', () => {
    expect(problems(form({}))).toEqual({ signature: 'Ask the client’s contact to sign, or say why no one could.' });
    expect(problems(form({ signature: drawing }))).toEqual({ signedByName: 'Type the name of the person who signed.' });
    expect(problems(form({ noSigner: true, unsignedReason: '  ' }))).toEqual({
      signature: 'Ask the client’s contact to sign, or say why no one could.',
    });
    expect(problems(form({ summary: ' ', signature: drawing, signedByName: 'Tobin Ashgrove' }))).toEqual({ summary: 'Required.' });
  });
});
