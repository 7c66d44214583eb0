import { dictionary } from '@zxcvbn-ts/language-common';

// OWASP ASVS 5.0 6.2.4: refuse passwords found in a list of commonly used passwords. The list
// (about 49,000 entries) is the common-password dictionary of the zxcvbn-ts project.
const common = new Set((dictionary['passwords-common'] as string[]).map((p) => p.toLowerCase()));

export function isCommonPassword(password: string): boolean {
  return common.has(password.toLowerCase());
}

/** Words that make a password easy to guess for this account. */
export function passwordWeakness(password: string, context: { email?: string; name?: string } = {}): string | null {
  if (isCommonPassword(password)) return 'This password is on a list of commonly used passwords. Choose another.';
  const lower = password.toLowerCase();
  const local = context.email?.split('@')[0]?.toLowerCase();
  if (local && local.length >= 4 && lower === local) return 'Do not use your e-mail address as your password.';
  if (/^(.)\1+$/.test(password)) return 'Do not use one character repeated.';
  return null;
}
