import { describe, expect, it } from 'vitest';
import { driveCurrent, storedCharge, tubeCapacitanceF } from '@shared/workbench/drive-current.ts';
import {
  HAZARDOUS_LIVE_LEVELS,
  actuatorPeakVolts,
  assessActuator,
  assessSafety,
  cautions,
  cautionsFor,
  pointsAboveLimit,
} from '@shared/workbench/safety.ts';

describe('drive current and stored charge', () => {
  it('when 3.4 nF is driven at 100 V, 1 kHz, then the peak current is 2.1 mA [calc]', () => {
    const d = driveCurrent({ capacitanceF: 3.4e-9, amplitudeV: 100, frequencyHz: 1000 });
    expect(d.peakCurrentA * 1e3).toBeCloseTo(2.1, 1);
    expect(d.rmsCurrentA).toBeCloseTo(d.peakCurrentA / Math.SQRT2, 15);
    expect(d.reactivePowerVar).toBeCloseTo(0.5 * 100 * d.peakCurrentA, 12); // V_rms·I_rms for a sine [calc]
  });

  it('when 1 µF is charged to 150 V, then it holds 150 µC and 11 mJ [calc]', () => {
    const s = storedCharge(1e-6, 150);
    expect(s.chargeC * 1e6).toBeCloseTo(150, 9);
    expect(s.energyJ * 1e3).toBeCloseTo(11, 0);
  });

  it('when a coaxial tube is computed, then it follows 2π·ε0·εr·L/ln(OD/ID) [memory]', () => {
    const c = tubeCapacitanceF({ lengthM: 12.7e-3, outerDiameterM: 6.35e-3, innerDiameterM: 5.334e-3, relPermittivity: 3400 });
    expect(c).toBeCloseTo((2 * Math.PI * 8.8541878128e-12 * 3400 * 12.7e-3) / Math.log(6.35 / 5.334), 20);
  });
});

describe('safety levels [S: IEC 61010-1 (2nd ed., 2001), clause 6.3.1 — memory for the clause; FIELD.md "Safety"]', () => {
  it('when the levels are read, then they are 30 V rms, 42.4 V peak, 60 V DC and 45 µC', () => {
    expect(HAZARDOUS_LIVE_LEVELS).toMatchObject({ rmsV: 30, peakV: 42.4, dcV: 60, chargeC: 45e-6 });
  });

  it('when a DC level is 60 V it is not flagged; 60.1 V is, and so is −120 V', () => {
    expect(assessSafety({ dcV: 60 }).highVoltage).toBe(false);
    expect(assessSafety({ dcV: 60.1 }).highVoltage).toBe(true);
    expect(assessSafety({ dcV: -120 }).highVoltage).toBe(true);
  });

  it('when a sine peaks at 42.4 V it is not flagged; at 43 V it is; an rms of 30.5 V is', () => {
    expect(assessSafety({ peakV: 42.4 }).highVoltage).toBe(false);
    expect(assessSafety({ peakV: 43 }).highVoltage).toBe(true);
    expect(assessSafety({ rmsV: 30.5 }).highVoltage).toBe(true);
    expect(assessSafety({ peakV: 43 }).crossed).toEqual(['43 V peak is above the 42.4 V peak level']);
  });

  it('when 1 µF sits at 150 V (150 µC), then stored charge is flagged; 3.4 nF at 100 V (0.34 µC) is high voltage only [calc]', () => {
    expect(assessSafety({ peakV: 150, chargeC: 150e-6 })).toMatchObject({ highVoltage: true, storedCharge: true });
    expect(assessSafety({ peakV: 100, chargeC: storedCharge(3.4e-9, 100).chargeC })).toMatchObject({
      highVoltage: true,
      storedCharge: false,
    });
  });

  it('when a µF stack sits at 40 V (40 µC), then nothing is flagged; 5 µF at 10 V (50 µC) flags the charge alone', () => {
    expect(assessSafety({ peakV: 40, chargeC: 40e-6 })).toMatchObject({ highVoltage: false, storedCharge: false });
    expect(assessSafety({ peakV: 10, chargeC: 50e-6 })).toMatchObject({ highVoltage: false, storedCharge: true });
  });

  it('when anything is flagged, then the cautions start with the levels and end with local codes; when nothing is, none show', () => {
    const shown = assessSafety({ peakV: 150, chargeC: 150e-6 }).cautions.map((c) => c.id);
    expect(shown).toEqual(['levels', 'amplifier', 'discharge', 'supply-off', 'reverse-voltage', 'local-codes']);
    expect(cautionsFor({ highVoltage: false, storedCharge: false })).toEqual([]);
    expect(cautions.discharge.text).toContain('10 kΩ');
    expect(cautions.discharge.source).toBe('Source: actuator vendor user manuals');
  });

  it('when an actuator is rated 30 V but a run went to 45 000 mV, then its peak is 45 V and it is flagged; points above the limit are listed', () => {
    const a = { maxVolts: 30, runs: [{ voltageUnit: 'mV' as const, points: [{ volts: 0 }, { volts: 45_000 }] }] };
    expect(actuatorPeakVolts(a)).toBe(45);
    expect(assessActuator(a).highVoltage).toBe(true);
    expect(pointsAboveLimit(a.runs[0].points, 'mV', 30)).toEqual([1]);
    expect(pointsAboveLimit([{ volts: 10 }], 'V', null)).toEqual([]);
  });
});
