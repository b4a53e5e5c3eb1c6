// A workbench page's inputs in its URL: encoded compactly, read back field by field with the page's own
// form schema; a bad param falls back to that field's default and never throws. [practice] throughout.
import { describe, expect, test } from 'vitest';
import { decodeInputs, encodeInputs, escapeCell, unescapeCell } from '../../src/features/workbench/form/url-inputs.ts';
import { expectedGainForm } from '../../src/features/workbench/expected/expected-gain-form.ts';
import { fitForm, exampleRows, type FitFormValues } from '../../src/features/workbench/fit/fit-form.ts';
import { mixingForm, type MixingFormValues } from '../../src/features/workbench/mixing/mixing-form.ts';

const params = (search: string) => new URLSearchParams(search);

const expectedDefaults = {
  spec: { actuator: 'bimorph-series', lengthMm: 12, thicknessMm: 0.6, outerDiameterMm: 6.35, wallMm: 0.508, layers: 200, plates: 1 },
  materialKey: 'PZT-5A',
  custom: {},
  tolerances: {},
};

const fitDefaults: FitFormValues = {
  source: 'grid',
  rows: exampleRows,
  csvText: '',
  voltageUnit: 'V',
  displacementUnit: 'nm',
  model: 'intercept',
};
const fitUrl = {
  skip: ['csvText'],
  grids: { rows: { param: 'pts', columns: ['volts', 'displacement', 'sweep'], short: { sweep: { up: 'u', down: 'd' } } } },
};

const mixingDefaults: MixingFormValues = {
  gain: [
    [70.7107, -70.7107],
    [70.7107, 70.7107],
  ],
  limits: { vaMinV: -15, vaMaxV: 15, vbMinV: -15, vbMaxV: 15 },
  targetXNm: 500,
  targetYNm: 1200,
};

describe('encodeInputs', () => {
  test('when every field is at its default, then the search is empty', () => {
    expect(encodeInputs(expectedGainForm, expectedDefaults, expectedDefaults)).toBe('');
  });

  test('when scalar fields change, then each is a plain key=value, named by its last segment where unique', () => {
    const values = {
      ...expectedDefaults,
      spec: { ...expectedDefaults.spec, actuator: 'tube-quadrant', lengthMm: 25 },
      measuredNmPerV: 88.5,
    };
    const search = encodeInputs(expectedGainForm, values, expectedDefaults);
    expect(search).toBe('?actuator=tube-quadrant&spec.lengthMm=25&measuredNmPerV=88.5');
  });

  test('when an optional field with a default is emptied, then it is written as key= so a reload keeps it empty', () => {
    expect(encodeInputs(mixingForm, { ...mixingDefaults, targetXNm: undefined }, mixingDefaults)).toBe('?targetXNm=');
  });

  test('when the gain matrix changes, then it is one param, rows by ; and cells by ,', () => {
    const values = {
      ...mixingDefaults,
      gain: [
        [100, 0],
        [0, 90.5],
      ],
    };
    expect(encodeInputs(mixingForm, values, mixingDefaults)).toBe('?gain=100,0;0,90.5');
  });

  test('when grid rows hold a decimal comma, then the cell is escaped and the pasted CSV text is left out', () => {
    const values: FitFormValues = {
      ...fitDefaults,
      rows: [
        { volts: '0', displacement: '0,1', sweep: 'up' },
        { volts: '10', displacement: '1.0', sweep: '' },
      ],
      csvText: 'V,x\n0,0\n10,1',
    };
    expect(encodeInputs(fitForm, values, fitDefaults, fitUrl)).toBe('?pts=0,0~c1,u;10,1.0,');
  });
});

describe('decodeInputs', () => {
  test('round trip: what is encoded reads back to the same values', () => {
    const values: FitFormValues = {
      source: 'csv',
      rows: [
        { volts: '0', displacement: '0,1', sweep: 'up' },
        { volts: '5;', displacement: '~a', sweep: 'down' },
        { volts: '', displacement: '', sweep: '' },
      ],
      csvText: '',
      voltageUnit: 'mV',
      displacementUnit: 'um',
      model: 'origin',
    };
    const search = encodeInputs(fitForm, values, fitDefaults, fitUrl);
    expect(decodeInputs(fitForm, params(search), fitDefaults, fitUrl)).toEqual(values);

    const mixing = {
      ...mixingDefaults,
      gain: [
        [1e-3, -2.5],
        [3, 4],
      ],
      limits: { vaMinV: -100, vaMaxV: 120, vbMinV: 0, vbMaxV: 60 },
      targetYNm: undefined,
    };
    expect(decodeInputs(mixingForm, params(encodeInputs(mixingForm, mixing, mixingDefaults)), mixingDefaults)).toEqual(mixing);
  });

  test('when params are bad, then those fields keep their defaults and the good ones are read', () => {
    const read = decodeInputs(
      expectedGainForm,
      params('actuator=warp-drive&spec.lengthMm=abc&spec.thicknessMm=0,8&measuredNmPerV=-5&materialKey=PZT-5H&junk=1'),
      expectedDefaults,
    );
    expect(read).toEqual({ ...expectedDefaults, spec: { ...expectedDefaults.spec, thicknessMm: 0.8 }, materialKey: 'PZT-5H' });
  });

  test('when a matrix or a grid param is malformed, then it keeps its default; the CSV text never comes from the link', () => {
    expect(decodeInputs(mixingForm, params('gain=1,2;3'), mixingDefaults).gain).toEqual(mixingDefaults.gain);
    expect(decodeInputs(mixingForm, params('gain=1,x;3,4'), mixingDefaults).gain).toEqual(mixingDefaults.gain);
    const fit = decodeInputs(fitForm, params('pts=0,1,sideways&csvText=evil&source=nope'), fitDefaults, fitUrl);
    expect(fit).toEqual(fitDefaults);
  });

  test('when the search is empty, then the defaults come back as a copy', () => {
    const read = decodeInputs(mixingForm, params(''), mixingDefaults);
    expect(read).toEqual(mixingDefaults);
    expect(read).not.toBe(mixingDefaults);
  });
});

describe('cell escapes', () => {
  test.each(['1,5', 'a;b', '~', '~c', ',;~', ''])('%j survives escape and unescape', (s) => {
    expect(unescapeCell(escapeCell(s))).toBe(s);
    expect(escapeCell(s)).not.toMatch(/[,;]/);
  });
});
