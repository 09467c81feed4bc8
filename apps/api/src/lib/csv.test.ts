import { describe, expect, it } from 'vitest';
import { toCsv } from './csv';

// Expected text follows RFC 4180 §2 (quoting) and the OWASP "CSV Injection" page (formula prefix).
describe('toCsv', () => {
  it.each([
    ['plain text', [['Hang new hammers', 120]], 'Hang new hammers,120\r\n'],
    ['a comma', [['Travel, space', 1]], '"Travel, space",1\r\n'],
    ['double quotes', [['5 ft 10 in "Salon"']], '"5 ft 10 in ""Salon"""\r\n'],
    ['a line break', [['line one\nline two']], '"line one\nline two"\r\n'],
    ['an empty value', [[null, '']], ',\r\n'],
    ['a formula', [['=SUM(A1:A2)', '+1', '-2', '@x']], "'=SUM(A1:A2),'+1,'-2,'@x\r\n"],
    ['a formula with a comma', [['=1,2']], `"'=1,2"\r\n`],
    ['booleans and negative numbers as they are', [[true, -90]], 'true,-90\r\n'],
    ['two records', [['a'], ['b']], 'a\r\nb\r\n'],
  ])('when a field holds %s, then it is written as RFC 4180 says', (_label, rows, expected) => {
    expect(toCsv(rows)).toBe(expected);
  });
});
