// Thin wrappers over the pure calculations in shared/workbench: each takes a parsed body, calls the
// shared functions and answers plain JSON with unit-suffixed names, plus cautions where
// shared/workbench/safety.ts applies. Nothing is stored.
import { fitCalibrationInUnits, toFitResultDto } from '@shared/workbench/calibration-fit.ts';
import { creepPct, fitCreep } from '@shared/workbench/creep.ts';
import { driveCurrent, safetyFlags, storedCharge } from '@shared/workbench/drive-current.ts';
import { expectedGain, type ExpectedGain } from '@shared/workbench/expected-gain.ts';
import { FitInputError } from '@shared/workbench/fit-input-error.ts';
import { isMaterialKey, materials } from '@shared/workbench/materials.ts';
import {
  fitGainMatrix,
  invertGain,
  isReachable,
  mixingSinAngle,
  reachableRegion,
  voltsFor,
  type GainMatrix,
} from '@shared/workbench/mixing.ts';
import { peakToPeakGain, type PeakToPeakResult } from '@shared/workbench/peak-to-peak.ts';
import {
  cantileverSpringConstantNPerM,
  rectangularBeamMassKg,
  rectangularCantileverHz,
  tipMassCorrectedHz,
} from '@shared/workbench/resonance.ts';
import { HIGH_VOLTAGE_THRESHOLD_V, cautionsFor, type Caution } from '@shared/workbench/safety.ts';
import {
  bitsNeeded,
  dacResolution,
  frameTiming,
  lineRateCeilings,
  quasiStaticGainError,
} from '@shared/workbench/scan-planner.ts';
import {
  currentRatioPerAngstrom,
  decayConstantPerAngstrom,
  gapChangePerDecadeAngstrom,
} from '@shared/workbench/tunnelling.ts';
import { convertDisplacement, toNm } from '@shared/units.ts';
import type {
  CreepInput,
  DriveCurrentInput,
  ExpectedGainInput,
  FitInput,
  FitResultDto,
  GainMatrixFitInput,
  MixingInput,
  PeakToPeakInput,
  ResonanceInput,
  ScanPlanInput,
  TunnellingInput,
  UnitConversionInput,
} from '@shared/schemas/workbench.ts';
import { AppError } from '../errors.ts';

/** Some number inside is NaN or ±Infinity, which JSON would silently turn into null. */
function hasNonFinite(value: unknown): boolean {
  if (typeof value === 'number') return !Number.isFinite(value);
  if (Array.isArray(value)) return value.some(hasNonFinite);
  return value !== null && typeof value === 'object' && Object.values(value).some(hasNonFinite);
}

/**
 * Run a shared calculation, turning its input refusals into 400s with the refusal's own code;
 * inputs so extreme that a result overflows double precision are refused too (400 out_of_range).
 */
export function asBadRequest<T>(compute: () => T): T {
  let result: T;
  try {
    result = compute();
  } catch (err) {
    if (err instanceof FitInputError) throw new AppError(400, err.code, err.message, err.details);
    if (err instanceof RangeError) throw new AppError(400, 'invalid_input', err.message);
    throw err;
  }
  if (hasNonFinite(result)) throw new AppError(400, 'out_of_range', 'These values are too large or too small to calculate with; try other units.');
  return result;
}

/** The calibration fit exactly as runs store it: same shared code, same DTO. */
export function computeFit(input: FitInput): FitResultDto {
  return asBadRequest(() => toFitResultDto(fitCalibrationInUnits(input)));
}

/** Peak-to-peak gain for a sine drive, limited by the reading resolution. */
export function computePeakToPeak(input: PeakToPeakInput): PeakToPeakResult {
  return asBadRequest(() => peakToPeakGain(input));
}

/** Logarithmic creep law fitted to a step-and-hold record, with its projection to later times. */
export function computeCreep(input: CreepInput) {
  return asBadRequest(() => {
    const fit = fitCreep(input.samples);
    return {
      ...fit,
      creepAt10sPct: creepPct(fit.gamma, 10),
      creepAt100sPct: creepPct(fit.gamma, 100),
      creepAt1000sPct: creepPct(fit.gamma, 1000),
    };
  });
}

/** Expected free gain with its ±20 % band; names the material row's source when built in. */
export function computeExpectedGain(input: ExpectedGainInput): ExpectedGain & { materialSource: string | null } {
  return asBadRequest(() => ({
    ...expectedGain(input),
    materialSource: isMaterialKey(input.material) ? materials[input.material].source : null,
  }));
}

function highVoltageCautions(volts: readonly number[]): Caution[] {
  return cautionsFor({ highVoltage: volts.some((v) => Math.abs(v) > HIGH_VOLTAGE_THRESHOLD_V), storedCharge: false });
}

/** G⁻¹, the reachable region and, for a wanted point, its drive voltages and reachability. */
export function computeMixing(input: MixingInput) {
  return asBadRequest(() => {
    const g: GainMatrix = input.gain;
    const inverseVPerNm = invertGain(g);
    const target = input.target
      ? {
          xNm: input.target.xNm,
          yNm: input.target.yNm,
          ...voltsFor(g, input.target.xNm, input.target.yNm),
          reachable: isReachable(g, input.limits, input.target.xNm, input.target.yNm),
        }
      : null;
    const { vaMinV, vaMaxV, vbMinV, vbMaxV } = input.limits;
    return {
      inverseVPerNm,
      sinAngle: mixingSinAngle(g),
      regionNm: reachableRegion(g, input.limits),
      target,
      cautions: highVoltageCautions([vaMinV, vaMaxV, vbMinV, vbMaxV]),
    };
  });
}

/** Least-squares G (nm/V) from a grid of drive pairs and measured tip positions. */
export function computeMixingFit(input: GainMatrixFitInput) {
  return asBadRequest(() => {
    const fit = fitGainMatrix(input.samples);
    return { n: fit.n, gainNmPerV: fit.gain, residualStdXNm: fit.residualStdXNm, residualStdYNm: fit.residualStdYNm };
  });
}

/** Step, range, frame timing and line-rate ceilings for a drive chain and raster. */
export function computeScanPlan(input: ScanPlanInput) {
  return asBadRequest(() => {
    const resolution = dacResolution(input);
    const timing = frameTiming(input);
    const ceilings = input.resonanceHz === undefined ? null : lineRateCeilings(input.resonanceHz);
    const gainError =
      input.resonanceHz !== undefined && input.lineRateHz < input.resonanceHz
        ? quasiStaticGainError(input.lineRateHz, input.resonanceHz) * 100
        : null;
    return {
      lsbNm: resolution.lsbNm,
      rangeNm: resolution.rangeNm,
      outputSpanV: resolution.outputSpanV,
      bitsNeeded: input.wantedStepNm === undefined ? null : bitsNeeded(resolution.rangeNm, input.wantedStepNm),
      frameTimeS: timing.frameTimeS,
      pixelTimeS: timing.pixelTimeS,
      tipSpeedNmPerS: timing.tipSpeedNmPerS,
      lineRateCeilingSineLikeHz: ceilings?.sineLikeHz ?? null,
      lineRateCeilingTriangleHz: ceilings?.triangleHz ?? null,
      gainErrorAtLineRatePct: gainError,
      cautions: highVoltageCautions([resolution.outputSpanV]),
    };
  });
}

/** First bending mode of a rectangular cantilever; spring constant and tip mass when the width is known. */
export function computeResonance(input: ResonanceInput) {
  return asBadRequest(() => {
    const firstModeHz = rectangularCantileverHz(input);
    const tipMassKg = input.tipMassKg ?? 0;
    if (input.widthM === undefined) {
      if (tipMassKg > 0) throw new RangeError('a tip mass needs the width, so that the beam mass is known');
      return { firstModeHz, springConstantNPerM: null, beamMassKg: null, withTipMassHz: null };
    }
    const beam = { ...input, widthM: input.widthM };
    const beamMassKg = rectangularBeamMassKg(beam);
    return {
      firstModeHz,
      springConstantNPerM: cantileverSpringConstantNPerM(beam),
      beamMassKg,
      withTipMassHz: tipMassKg > 0 ? tipMassCorrectedHz(firstModeHz, beamMassKg, tipMassKg) : null,
    };
  });
}

/** Current and reactive power a sine drive asks of the amplifier, and the charge left on the load. */
export function computeDriveCurrent(input: DriveCurrentInput) {
  return asBadRequest(() => {
    const current = driveCurrent(input);
    const stored = storedCharge(input.capacitanceF, input.amplitudeV);
    const flags = safetyFlags({ voltageV: input.amplitudeV, capacitanceF: input.capacitanceF });
    return {
      ...current,
      storedChargeC: stored.chargeC,
      storedEnergyJ: stored.energyJ,
      highVoltage: flags.highVoltage,
      storedCharge: flags.storedCharge,
      cautions: flags.cautions,
    };
  });
}

/** Decay constant, current ratio per Å and gap change per decade for a barrier height. */
export function computeTunnelling(input: TunnellingInput) {
  return asBadRequest(() => ({
    decayConstantPerAngstrom: decayConstantPerAngstrom(input.workFunctionEv),
    currentRatioPerAngstrom: currentRatioPerAngstrom(input.workFunctionEv),
    gapChangePerDecadeAngstrom: gapChangePerDecadeAngstrom(input.workFunctionEv),
  }));
}

/** A displacement in another unit, and in nm for reference. */
export function computeConversion(input: UnitConversionInput) {
  return asBadRequest(() => ({
    value: input.value,
    from: input.from,
    to: input.to,
    converted: convertDisplacement(input.value, input.from, input.to),
    valueNm: toNm(input.value, input.from),
  }));
}
