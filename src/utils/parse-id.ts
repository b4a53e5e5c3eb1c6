/** A record id from a URL segment or query value: a positive whole number of up to 10 digits, or null (the page shows "not found"). */
export const parseId = (raw: string | null | undefined): number | null =>
  raw && /^\d{1,10}$/.test(raw) && Number(raw) > 0 ? Number(raw) : null;
