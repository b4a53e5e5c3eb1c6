import { assessActuator } from '@shared/workbench/safety.ts';
import { SafetyNotice } from '@/components/ui/safety-notice.tsx';

/** The shared cautions once the drive limit (or the charge it leaves on the part) crosses the IEC 61010-1 levels. */
export function HighVoltageCaution({
  maxVolts,
  capacitanceNf,
}: {
  maxVolts: number | undefined;
  capacitanceNf: number | null | undefined;
}) {
  if (maxVolts === undefined || !Number.isFinite(maxVolts)) return null;
  const safety = assessActuator({ maxVolts }, capacitanceNf);
  return <SafetyNotice cautions={safety.cautions} crossed={safety.crossed} />;
}
