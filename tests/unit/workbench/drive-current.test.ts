import { describe, expect, it } from 'vitest';
import { driveCurrent, safetyFlags, storedCharge, tubeCapacitanceF } from '@shared/workbench/drive-current.ts';
import {
  HIGH_VOLTAGE_THRESHOLD_V,
  STORED_CHARGE_THRESHOLD_C,
  STORED_ENERGY_THRESHOLD_J,
  cautions,
  cautionsFor,
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

describe('safety flags [practice thresholds; FIELD.md "Safety"]', () => {
  it('when |V| exceeds 50 V, then high voltage is flagged; at 50 V it is not', () => {
    expect(HIGH_VOLTAGE_THRESHOLD_V).toBe(50);
    expect(safetyFlags({ voltageV: 50 }).highVoltage).toBe(false);
    expect(safetyFlags({ voltageV: 50.1 }).highVoltage).toBe(true);
    expect(safetyFlags({ voltageV: -120 }).highVoltage).toBe(true);
  });

  it('when 1 µF sits at 150 V, then stored charge is flagged too; 3.4 nF at 100 V is high voltage only', () => {
    expect(safetyFlags({ voltageV: 150, capacitanceF: 1e-6 })).toMatchObject({ highVoltage: true, storedCharge: true });
    expect(safetyFlags({ voltageV: 100, capacitanceF: 3.4e-9 })).toMatchObject({ highVoltage: true, storedCharge: false });
  });

  it('when a µF stack sits below 50 V, then the energy or charge limit alone trips the flag', () => {
    expect(STORED_ENERGY_THRESHOLD_J).toBe(1e-3);
    expect(STORED_CHARGE_THRESHOLD_C).toBe(50e-6);
    expect(safetyFlags({ voltageV: 45, capacitanceF: 1e-6 }).storedCharge).toBe(true); // 1.01 mJ
    expect(safetyFlags({ voltageV: 10, capacitanceF: 5e-6 }).storedCharge).toBe(true); // 50 µC
    expect(safetyFlags({ voltageV: 10, capacitanceF: 1e-6 }).storedCharge).toBe(false);
  });

  it('when anything is flagged, then the cautions end with local codes; when nothing is, none show', () => {
    const shown = safetyFlags({ voltageV: 150, capacitanceF: 1e-6 }).cautions.map((c) => c.id);
    expect(shown).toEqual(['amplifier', 'discharge', 'supply-off', 'reverse-voltage', 'local-codes']);
    expect(cautionsFor({ highVoltage: false, storedCharge: false })).toEqual([]);
    expect(cautions.discharge.text).toContain('10 kΩ');
    expect(cautions.discharge.source).toBe('[S: actuator vendor user manuals]');
  });
});
