import type { LinearisationDto } from '@shared/schemas/linearise.ts';
import type { StoredLinearisation } from '@shared/workbench/linearise.ts';

/** The summary an actuator shows of its saved linearisation (never the table itself: that is a download). */
export function presentLinearisation(json: string | null | undefined): LinearisationDto | null {
  if (!json) return null;
  try {
    const { result, measuredOn, savedAt } = JSON.parse(json) as StoredLinearisation;
    return {
      branches: Object.fromEntries(
        Object.entries(result.branches).map(([name, b]) => [
          name,
          { degree: b!.degree, n: b!.n, residualStdNm: b!.residualStdNm, r2: b!.r2 },
        ]),
      ),
      nonlinearityPctBefore: result.nonlinearityPctBefore,
      residualNonlinearityPctAfter: result.residualNonlinearityPctAfter,
      spanNm: result.spanNm,
      tableRows: result.table.length,
      measuredOn,
      savedAt,
    };
  } catch {
    return null;
  }
}
