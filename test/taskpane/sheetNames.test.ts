/**
 * Sheet names (unique, legal, quoted in references) and A1 addresses.
 */
import {
  asCellText,
  cellAddress,
  columnLetters,
  legalSheetName,
  MAX_SHEET_NAME_LENGTH,
  rangeAddress,
  sheetRef,
  uniqueSheetName,
} from '../../src/taskpane/sheetNames';

describe('uniqueSheetName', () => {
  test('the base name where it is free', () => {
    expect(uniqueSheetName('Potentials', ['Sheet1'])).toBe('Potentials');
  });
  test('Potentials exists: Potentials (2); both exist: Potentials (3)', () => {
    expect(uniqueSheetName('Potentials', ['Sheet1', 'Potentials'])).toBe('Potentials (2)');
    expect(uniqueSheetName('Potentials', ['Potentials', 'Potentials (2)'])).toBe('Potentials (3)');
  });
  test('Excel compares names without case', () => {
    expect(uniqueSheetName('Potentials', ['POTENTIALS'])).toBe('Potentials (2)');
  });
  test('a gap is filled: the first free number is used', () => {
    expect(uniqueSheetName('Potentials', ['Potentials', 'Potentials (3)'])).toBe('Potentials (2)');
  });
  test('long names are shortened to keep the suffix within 31 characters', () => {
    const base = 'E vs log a([Fe(CN)6]3-) at 25 degrees';
    const first = uniqueSheetName(base, []);
    expect(first.length).toBeLessThanOrEqual(MAX_SHEET_NAME_LENGTH);
    const second = uniqueSheetName(base, [first]);
    expect(second.length).toBeLessThanOrEqual(MAX_SHEET_NAME_LENGTH);
    expect(second.endsWith(' (2)')).toBe(true);
    expect(second.toLowerCase()).not.toBe(first.toLowerCase());
  });
});

describe('legalSheetName', () => {
  test('forbidden characters become spaces', () => {
    expect(legalSheetName('E vs log a[Cu2+]')).toBe('E vs log a Cu2+');
    expect(legalSheetName('a/b\\c?d*e:f')).toBe('a b c d e f');
  });
  test('no leading or trailing apostrophe; never empty; not the reserved "History"', () => {
    expect(legalSheetName("'quoted'")).toBe('quoted');
    expect(legalSheetName('   ')).toBe('Sheet');
    expect(legalSheetName('history')).toBe('history 1');
  });
});

describe('sheetRef', () => {
  test('bare where Excel accepts it bare, quoted otherwise', () => {
    expect(sheetRef('Potentials')).toBe('Potentials');
    expect(sheetRef('Potentials (2)')).toBe("'Potentials (2)'");
    expect(sheetRef('E vs pH')).toBe("'E vs pH'");
    expect(sheetRef("Bob's data")).toBe("'Bob''s data'");
    expect(sheetRef('A1')).toBe("'A1'");
    expect(sheetRef('R1C1')).toBe("'R1C1'");
    expect(sheetRef('2024')).toBe("'2024'");
  });
});

describe('addresses', () => {
  test('column letters', () => {
    expect(columnLetters(1)).toBe('A');
    expect(columnLetters(26)).toBe('Z');
    expect(columnLetters(27)).toBe('AA');
    expect(columnLetters(702)).toBe('ZZ');
    expect(columnLetters(703)).toBe('AAA');
    expect(() => columnLetters(0)).toThrow(RangeError);
  });
  test('cells and ranges', () => {
    expect(cellAddress(4, 7)).toBe('D7');
    expect(rangeAddress(1, 2, 4, 131)).toBe('A2:D131');
    expect(rangeAddress(2, 3, 2, 3)).toBe('B3');
    expect(() => cellAddress(1, 0)).toThrow(RangeError);
  });
});

describe('asCellText', () => {
  test('text that Excel would read as a formula gets the apostrophe prefix', () => {
    expect(asCellText('=ECHEM.NERNSTSLOPE()')).toBe("'=ECHEM.NERNSTSLOPE()");
    expect(asCellText('-> Cu')).toBe("'-> Cu");
    expect(asCellText('+1')).toBe("'+1");
    expect(asCellText('Cu2+ + 2 e- -> Cu')).toBe('Cu2+ + 2 e- -> Cu');
  });
});
