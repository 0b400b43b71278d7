import { csvCell, parseCsv, phoneKey, readRow, suggestMapping } from './import-rows';

describe('reading import rows', () => {
  it('parses comma, semicolon and quoted cells with papaparse, header as line 1', () => {
    const csv = parseCsv('\uFEFFName;Notes\r\n"Quill, Ada";"said ""hi"""\r\n\r\nBo;\r\n');
    expect(csv.columns).toEqual(['Name', 'Notes']);
    expect(csv.rows).toEqual([
      { line: 2, cells: ['Quill, Ada', 'said "hi"'] },
      { line: 4, cells: ['Bo', ''] },
    ]);
  });

  it('suggests a field per header once, and leaves unknown headers unmapped', () => {
    expect(suggestMapping(['Full name', 'E-Mail', 'Tel.', 'Colour', 'Color', 'Loyalty points'])).toEqual({
      'Full name': 'customer.name',
      'E-Mail': 'customer.email',
      'Tel.': 'customer.phone',
      Colour: 'bike.colour',
      Color: '',
      'Loyalty points': '',
    });
  });

  it('needs a way to reach the owner: without e-mail and phone the row has a phone problem', () => {
    const cols = ['Name', 'Phone'];
    const row = readRow(cols, ['Bram Oduya', '07700 900222'], { Name: 'customer.name', Phone: '' });
    expect(row.problems.map((p) => p.field)).toEqual(['customer.phone']);
    expect(readRow(cols, ['Bram Oduya', '07700 900222'], { Name: 'customer.name', Phone: 'customer.phone' }).customer).toMatchObject({
      preferredChannel: 'phone',
    });
  });

  it('knows the usual words for frame materials and brakes, and names what it does not know', () => {
    const cols = ['Name', 'Email', 'Make', 'Model', 'Frame', 'Speeds', 'Brakes'];
    const map = suggestMapping(cols);
    const ok = readRow(cols, ['A B', 'a@b.test', 'X', 'Y', 'Aluminum', '11', 'Hydraulic disc'], map);
    expect(ok.bike).toMatchObject({
      frameMaterial: 'aluminium',
      brakeType: 'hydraulic_disc',
      drivetrainSpeeds: 11,
      cableRouting: 'external',
      dropoutType: 'vertical',
    });
    const bad = readRow(cols, ['A B', 'a@b.test', 'X', 'Y', 'balsa', '11', 'coaster'], map);
    expect(bad.problems.map((p) => p.field)).toEqual(['bike.frameMaterial', 'bike.brakeType']);
  });

  it('matches phones written differently by their last nine digits', () => {
    expect(phoneKey('+44 7700 900301')).toBe(phoneKey('07700 900301'));
    expect(phoneKey('123')).toBeNull();
  });

  // OWASP "CSV Injection": cells starting with = + - @ tab or CR are prefixed with an apostrophe.
  it.each([
    ["=cmd|' /C calc'!A0", `"'=cmd|' /C calc'!A0"`],
    ['+1 555', `"'+1 555"`],
    ['-2', `"'-2"`],
    ['@SUM(A1)', `"'@SUM(A1)"`],
    ['plain "text"', `"plain ""text"""`],
  ])('writes %s as %s', (value, cell) => {
    expect(csvCell(value)).toBe(cell);
  });
});
