// Drive-current, tunnelling and unit-conversion pages and APIs.
import { driveCurrentInput, tunnellingInput, unitConversionInput } from '../../schemas/workbench.ts';
import { convertQuantity, kindOfUnit, unitsOfKind } from '../../units.ts';
import { driveCurrent, storedCharge } from '../drive-current.ts';
import { assessSafety } from '../safety.ts';
import { currentRatioPerAngstrom, decayConstantPerAngstrom, gapChangePerDecadeAngstrom, workFunctionForRatioEv } from '../tunnelling.ts';
import { defineCalculator } from './calculator.ts';

/** Current and reactive power a sine drive asks of the amplifier, and the charge left on the load. */
export const driveCurrentCalculator = defineCalculator({
  slug: 'drive-current',
  input: driveCurrentInput,
  compute(input) {
    const current = driveCurrent(input);
    const stored = storedCharge(input.capacitanceF, input.amplitudeV);
    const safety = assessSafety({ peakV: input.amplitudeV, rmsV: current.rmsVoltageV, chargeC: stored.chargeC });
    return {
      ...current,
      storedChargeC: stored.chargeC,
      storedEnergyJ: stored.energyJ,
      highVoltage: safety.highVoltage,
      storedCharge: safety.storedCharge,
      levelsCrossed: safety.crossed,
      warnings: [],
      cautions: safety.cautions,
    };
  },
});

/** Decay constant, current ratio per Å, gap change per decade, and the barrier for a wanted ratio. */
export const tunnellingCalculator = defineCalculator({
  slug: 'tunnelling',
  input: tunnellingInput,
  compute(input) {
    return {
      decayConstantPerAngstrom: decayConstantPerAngstrom(input.workFunctionEv),
      currentRatioPerAngstrom: currentRatioPerAngstrom(input.workFunctionEv),
      gapChangePerDecadeAngstrom: gapChangePerDecadeAngstrom(input.workFunctionEv),
      workFunctionForWantedRatioEv: input.wantedRatio === undefined ? null : workFunctionForRatioEv(input.wantedRatio),
      warnings: [],
      cautions: [],
    };
  },
});

/** A displacement, voltage or gain in another unit of its kind, and in every unit of that kind. */
export const convertCalculator = defineCalculator({
  slug: 'convert',
  input: unitConversionInput,
  compute(input) {
    const converted = convertQuantity(input.value, input.from, input.to);
    return {
      value: input.value,
      from: input.from,
      to: input.to,
      converted,
      /** The value in nm (displacements), V (voltages) or nm/V (gains), the unit every computation works in. */
      valueInBase: convertQuantity(input.value, input.from, unitsOfKind(input.from)[0].key),
      valueNm: kindOfUnit(input.from) === 'displacement' ? convertQuantity(input.value, input.from, 'nm') : null,
      inEveryUnit: unitsOfKind(input.from).map((unit) => ({
        unit: unit.key,
        label: unit.label,
        value: convertQuantity(input.value, input.from, unit.key),
      })),
      warnings: [],
      cautions: [],
    };
  },
});
