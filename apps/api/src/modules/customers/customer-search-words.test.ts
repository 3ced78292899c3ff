// The words a customer is found by and the terms a query becomes (the decision is in
// DEVELOPERS.md, "Customer search"; the behaviour is our own rule, no published source).
import { describe, expect, it } from 'vitest';
import { customerSearchWords, prefixPattern, searchTerms } from './customer-search-words.js';

describe('customer search words', () => {
  it('holds each word of the name and e-mail and their tails after punctuation', () => {
    const words = customerSearchWords({
      name: "Maeve O'Brien-Hale",
      email: 'maeve.obh@example.test',
      phone: null,
    });
    expect(words).toEqual(
      expect.arrayContaining([
        'maeve',
        "o'brien-hale",
        'brien-hale',
        'hale',
        'maeve.obh@example.test',
        'obh@example.test',
        'example.test',
        'test',
      ]),
    );
    expect(words).not.toContain('aeve');
  });

  it('holds the phone digits from each digit group on', () => {
    const words = customerSearchWords({ name: 'X', email: null, phone: '(555) 014-7777' });
    expect(words).toEqual(expect.arrayContaining(['5550147777', '0147777', '7777']));
    expect(words).not.toContain('147777');
  });

  it('keeps at most 100 characters of a word', () => {
    const [word] = customerSearchWords({ name: 'a'.repeat(150), email: null, phone: null });
    expect(word).toHaveLength(100);
  });
});

describe('customer search terms', () => {
  it('splits on spaces, lowercases and drops repeats', () => {
    expect(searchTerms('  Fern  MARL fern ')).toEqual(['fern', 'marl']);
    expect(searchTerms('')).toEqual([]);
  });

  it('reads a phone-like query as its digits', () => {
    expect(searchTerms('014-7777')).toEqual(['0147777']);
    expect(searchTerms('(555) 014')).toEqual(['555014']);
  });

  it('makes %, _ and \\ literal in the pattern', () => {
    expect(prefixPattern('100%_\\')).toBe('100\\%\\_\\\\%');
  });
});
