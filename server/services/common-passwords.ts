import { ZxcvbnFactory, type ZxcvbnResult } from '@zxcvbn-ts/core';
import { adjacencyGraphs, dictionary } from '@zxcvbn-ts/language-common';

// OWASP ASVS 5.0 6.2.4 and 6.2.11: refuse commonly used passwords and passwords built from the
// product's or the person's own words. zxcvbn-ts estimates how many guesses a password takes,
// knowing about 49,000 common passwords, keyboard runs, dates, repeats and l33t spellings; the
// account's own words are given to it as `userInputs`, so "gridkeep-demo" or an e-mail address
// count as a handful of guesses.
//
// Minimum score 3 (zxcvbn: at least 10^8 guesses, "safely unguessable" online and a moderate
// defence if the hashes ever leaked, at argon2id's cost per guess). 4 (10^10) would also refuse
// three-word passphrases that are easy to type on a phone; 2 lets through "Summer2024"-like
// patterns. Sign-in throttling bounds online guessing far below 10^8.
//
// The estimator runs on the server only: with its dictionaries it weighs about 250 KB gzipped
// (measured: common passwords 204 KB, core 24 KB, word list 18 KB), too much to send a phone on a
// site for one form; the 400 answer names the field and the reason, and the form shows it.
export const minimumPasswordScore = 3;

/** The product's own word: never part of a good password for it. */
const productWords = ['gridkeep'];

let estimator: ZxcvbnFactory | undefined;
const zxcvbn = () => (estimator ??= new ZxcvbnFactory({ dictionary, graphs: adjacencyGraphs }));

export interface PasswordContext {
  email?: string;
  name?: string;
  /** The client organisation a client user belongs to. */
  organisation?: string | null;
  /** The integrator's company name. */
  company?: string | null;
}

/** The words an attacker who knows this account would try first. */
export function userWords(context: PasswordContext): string[] {
  const words = new Set<string>(productWords);
  const add = (value: string | null | undefined) => {
    const v = value?.trim().toLowerCase();
    if (!v) return;
    words.add(v);
    for (const part of v.split(/[^\p{L}\p{N}]+/u)) if (part.length >= 3) words.add(part);
  };
  add(context.email);
  add(context.email?.split('@')[0]);
  add(context.name);
  add(context.organisation);
  add(context.company);
  return [...words];
}

export function estimatePassword(password: string, context: PasswordContext = {}): ZxcvbnResult {
  return zxcvbn().check(password, userWords(context));
}

/** Why this password is too easy to guess for this account, or null when it is good enough. */
export function passwordWeakness(password: string, context: PasswordContext = {}): string | null {
  const result = estimatePassword(password, context);
  if (result.score >= minimumPasswordScore) return null;
  const own = result.sequence.some((m) => m.pattern === 'dictionary' && m.dictionaryName === 'userInputs');
  if (own) return 'Too easy to guess: it is built from your name, e-mail address, organisation or “Gridkeep”. Choose other words.';
  const common = result.sequence.some((m) => m.pattern === 'dictionary' && m.dictionaryName === 'passwords-common');
  if (common) return 'Too easy to guess: it is, or looks like, a commonly used password. A few unrelated words are stronger.';
  return 'Too easy to guess. Make it longer: a few unrelated words are strong and easy to type on a phone.';
}
