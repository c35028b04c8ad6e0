import { describe, expect, it } from 'vitest';
import { csvCell, csvRecord } from './csv';

// Expected strings follow RFC 4180 §2 (rules 5–7) and the OWASP "CSV Injection" page's advice.
describe('CSV cells', () => {
  it('leaves plain text and numbers as they are', () => {
    expect(csvCell('Sensor')).toBe('Sensor');
    expect(csvCell(95)).toBe('95');
    expect(csvCell(null)).toBe('');
  });

  it('quotes a field with a comma, a quote or a line break, and doubles its quotes (RFC 4180 rules 6 and 7)', () => {
    expect(csvCell('Plant North, Bay 2')).toBe('"Plant North, Bay 2"');
    expect(csvCell('Display said "ERR 31"')).toBe('"Display said ""ERR 31"""');
    expect(csvCell('line one\nline two')).toBe('"line one\nline two"');
    expect(csvCell('a\r\nb')).toBe('"a\r\nb"');
  });

  it('defuses text a spreadsheet would run as a formula', () => {
    expect(csvCell('=HYPERLINK("http://x.example","click")')).toBe(`"'=HYPERLINK(""http://x.example"",""click"")"`);
    expect(csvCell('+1-555')).toBe("'+1-555");
    expect(csvCell('-2 ohms')).toBe("'-2 ohms");
    expect(csvCell('@SUM(A1)')).toBe("'@SUM(A1)");
    expect(csvCell('\tcmd')).toBe("'\tcmd");
    expect(csvCell('a=b')).toBe('a=b');
  });

  // OWASP "CSV Injection" (owasp.org/www-community/attacks/CSV_Injection): no cell may begin with
  // = + - @ tab (0x09) or carriage return (0x0D), and the field separator, "," or ";", must not let
  // a formula start a new cell in the middle of the text.
  it('defuses a formula after a semicolon, which splits cells in ";" locales (OWASP CSV Injection)', () => {
    expect(csvCell('Semi;=HYPERLINK("http://evil.example","y")')).toBe(`"'Semi;=HYPERLINK(""http://evil.example"",""y"")"`);
    expect(csvCell('a;+cmd')).toBe(`"'a;+cmd"`);
    expect(csvCell('a;-2+3')).toBe(`"'a;-2+3"`);
    expect(csvCell('a;@SUM(A1)')).toBe(`"'a;@SUM(A1)"`);
    expect(csvCell('Bay 2; press 4')).toBe('"Bay 2; press 4"');
  });

  it('defuses cells that start with a tab or a carriage return (OWASP CSV Injection)', () => {
    expect(csvCell('\t=1+1')).toBe("'\t=1+1");
    expect(csvCell('\r=1+1')).toBe(`"'\r=1+1"`);
  });

  it('ends each record with CRLF (RFC 4180 rule 1)', () => {
    expect(csvRecord(['V-000001', 'x,y', 3])).toBe('V-000001,"x,y",3\r\n');
  });
});
