import { cautionsFor, HIGH_VOLTAGE_THRESHOLD_V, STORED_CHARGE_THRESHOLD_C, STORED_ENERGY_THRESHOLD_J } from '@shared/workbench/safety.ts';
import { Notice } from '@/components/ui/notice.tsx';

/** The shared high-voltage and stored-charge cautions once the drive limit or the part's capacitance calls for them. */
export function HighVoltageCaution({ maxVolts, capacitanceNf }: { maxVolts: number | undefined; capacitanceNf: number | null | undefined }) {
  if (maxVolts === undefined || !Number.isFinite(maxVolts)) return null;
  const c = (capacitanceNf ?? 0) * 1e-9;
  const highVoltage = Math.abs(maxVolts) > HIGH_VOLTAGE_THRESHOLD_V;
  const storedCharge = c * Math.abs(maxVolts) >= STORED_CHARGE_THRESHOLD_C || 0.5 * c * maxVolts * maxVolts >= STORED_ENERGY_THRESHOLD_J;
  const list = cautionsFor({ highVoltage, storedCharge });
  if (list.length === 0) return null;
  return (
    <Notice tone="caution" title={highVoltage ? `High voltage: above ${HIGH_VOLTAGE_THRESHOLD_V} V` : 'Stored charge'}>
      <ul className="list-disc space-y-1 pl-5">
        {list.map((c) => <li key={c.id}>{c.text}</li>)}
      </ul>
    </Notice>
  );
}
