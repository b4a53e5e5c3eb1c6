// The report vocabulary (targets, reasons and their words), apart from the zod schemas.

export const REPORT_TARGETS = ['build', 'run', 'part', 'listing', 'comment'] as const;
export type ReportTargetType = (typeof REPORT_TARGETS)[number];
export const REPORT_REASONS = ['wrong-data', 'spam', 'unsafe', 'offensive', 'duplicate', 'other'] as const;
export type ReportReason = (typeof REPORT_REASONS)[number];
export type ReportStatus = 'open' | 'resolved' | 'dismissed';
export const reportReasonLabels: Record<ReportReason, string> = {
  'wrong-data': 'Data looks wrong',
  spam: 'Spam or advertising',
  unsafe: 'Unsafe advice',
  offensive: 'Offensive',
  duplicate: 'Duplicate',
  other: 'Something else',
};
