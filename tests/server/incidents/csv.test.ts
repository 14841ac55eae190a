import { expect, it } from 'vitest';
import { csvCell, csvFileName } from '../../../server/incidents/csv';

// The cell rule of the export: OWASP's "CSV Injection" guidance names = + - @ tab and carriage
// return as the characters that start a formula; quoting follows RFC 4180.
it('puts an apostrophe before a cell a spreadsheet would run as a formula, and quotes what needs quoting', () => {
  expect(csvCell('=1+1')).toBe("'=1+1");
  expect(csvCell('+447700900123')).toBe("'+447700900123");
  expect(csvCell('-5')).toBe("'-5");
  expect(csvCell('@SUM(A1)')).toBe("'@SUM(A1)");
  expect(csvCell('\tcmd')).toBe("'\tcmd");
  expect(csvCell('\rcmd')).toBe('"\'\rcmd"');
  expect(csvCell('a = b')).toBe('a = b');
  expect(csvCell('said "stop", then')).toBe('"said ""stop"", then"');
  expect(csvCell('two\nlines')).toBe('"two\nlines"');
  expect(csvCell('')).toBe('');
});

it('names the file after the event in ASCII, or "all"', () => {
  expect(csvFileName('Harrowgate District Qualifier')).toBe('incidents-harrowgate-district-qualifier.csv');
  expect(csvFileName('Région Île-de-France — Jour 2')).toBe('incidents-region-ile-de-france-jour-2.csv');
  expect(csvFileName('🤖')).toBe('incidents-event.csv');
  expect(csvFileName(null)).toBe('incidents-all.csv');
});
