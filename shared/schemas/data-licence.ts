import type { DATA_LICENCE } from '../data-licence.ts';

/** The data licence and whether (and when) the signed-in maker accepted it for what they contribute. */
export interface DataLicenceAcceptanceDto {
  licence: typeof DATA_LICENCE;
  /** ISO time of the first acceptance, or null. */
  acceptedAt: string | null;
}
