import { assessActuator, cautionsFor, HAZARDOUS_LIVE_LEVELS, type ActuatorForSafety } from '@shared/workbench/safety.ts';
import { SafetyNotice } from '@/components/ui/safety-notice.tsx';

/** Id of the one full caution block on a build page, so each high-voltage actuator can point at it. */
export const HV_CAUTIONS_ID = 'high-voltage-cautions';

/** True when an actuator's limit or runs cross the IEC 61010-1 voltage levels (the shared rule). */
export const isHighVoltage = (a: ActuatorForSafety) => assessActuator(a).highVoltage;

/** The full cautions, shown once above the actuators when any of them crosses the levels. */
export function HighVoltageCautions() {
  return (
    <div id={HV_CAUTIONS_ID} className="scroll-mt-4">
      <SafetyNotice
        cautions={cautionsFor({ highVoltage: true, storedCharge: false })}
        title={`Hazardous voltage: some actuators of this build are driven above ${HAZARDOUS_LIVE_LEVELS.peakV} V peak or ${HAZARDOUS_LIVE_LEVELS.dcV} V DC`}
      />
    </div>
  );
}

/** A short amber line on one actuator, pointing to the full cautions. */
export function HighVoltageMarker({ actuator }: { actuator: ActuatorForSafety }) {
  const safety = assessActuator(actuator);
  return (
    <p className="flex flex-wrap items-center gap-x-2 rounded-md border border-amber bg-amber/10 px-3 py-1.5 text-sm">
      <span aria-hidden="true" className="font-bold text-amber">
        ⚠
      </span>
      <span>Hazardous voltage: {safety.crossed.join('; ')}.</span>
      <a href={`#${HV_CAUTIONS_ID}`} className="text-copper-dark underline">
        Read the cautions
      </a>
    </p>
  );
}
