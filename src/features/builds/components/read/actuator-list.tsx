import type { ActuatorDto } from '@shared/schemas/actuator.ts';
import { ActuatorCard } from './actuator-card.tsx';
import { HighVoltageCautions, isHighVoltage } from './high-voltage.tsx';

/** Every actuator of the build, with the high-voltage cautions once above them when any runs above the IEC 61010-1 levels. */
export function ActuatorList({ actuators }: { actuators: ActuatorDto[] }) {
  if (actuators.length === 0) return <p className="text-ink-soft">No actuators recorded yet.</p>;
  return (
    <div className="space-y-4">
      {actuators.some((a) => isHighVoltage(a)) && <HighVoltageCautions />}
      {actuators.map((a) => (
        <ActuatorCard key={a.id} actuator={a} />
      ))}
    </div>
  );
}
