// The audit trail's actions and things in our words.

export const AUDIT_TARGET_TYPES = ['build', 'run', 'part', 'report', 'listing', 'user'] as const;

export const targetTypeLabels: Record<string, string> = {
  build: 'Build',
  run: 'Calibration run',
  part: 'Part',
  report: 'Report',
  listing: 'Listing',
  user: 'Account',
  comment: 'Comment',
};

const actionLabels: Record<string, string> = {
  'build.publish': 'Published the build',
  'build.return': 'Returned the build with notes',
  'build.decline': 'Declined the build',
  'run.accept': 'Accepted the run',
  'run.reject': 'Rejected the run',
  'part.accept': 'Accepted the part',
  'part.reject': 'Rejected the part',
  'report.resolve': 'Resolved the report',
  'report.dismiss': 'Dismissed the report',
  'part.merge': 'Merged the part into another',
  'listing.hide': 'Hid the listing',
  'listing.unhide': 'Showed the listing again',
  'user.set-role': 'Changed the role',
  'user.suspend': 'Suspended the account',
  'user.reinstate': 'Reinstated the account',
  'token.revoke': 'Revoked a rig token',
};

/** "Returned the build with notes" for `build.return`; unknown actions show as recorded. */
export const actionLabel = (action: string) => actionLabels[action] ?? action;
