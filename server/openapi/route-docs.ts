// One description per route of the app: the OpenAPI document (openapi-document.ts) is built from this table and
// the shared zod schemas the routes parse with. tests/api/openapi.test.ts fails when a route of the app is missing
// here (or one listed here does not exist), when an example stops validating, or when `auth` or `idempotent` disagree
// with what the server does.
import type { RouteDoc } from './route-doc.ts';
import { serviceDocs } from './service-docs.ts';
import { sessionDocs } from './session-docs.ts';
import { accountDocs } from './account-docs.ts';
import { buildDocs } from './build-docs.ts';
import { actuatorDocs } from './actuator-docs.ts';
import { partDocs } from './part-docs.ts';
import { openDataDocs } from './open-data-docs.ts';
import { reviewDocs } from './review-docs.ts';
import { adminDocs } from './admin-docs.ts';
import { exchangeDocs } from './exchange-docs.ts';
import { workbenchDocs } from './workbench-docs.ts';
import { shareDocs } from './share-docs.ts';
import { commentDocs } from './comment-docs.ts';
import { conversationDocs } from './conversation-docs.ts';

/** Every route of the app, grouped by resource (one file each). */
export const ROUTE_DOCS: readonly RouteDoc[] = [
  ...serviceDocs,
  ...sessionDocs,
  ...accountDocs,
  ...buildDocs,
  ...actuatorDocs,
  ...partDocs,
  ...openDataDocs,
  ...reviewDocs,
  ...adminDocs,
  ...exchangeDocs,
  ...workbenchDocs,
  ...shareDocs,
  ...commentDocs,
  ...conversationDocs,
];

/** Tags in the order the document and the reference page list them, each with a line of its own. */
export const ROUTE_TAGS: ReadonlyArray<{ name: string; description: string }> = [
  { name: 'Actuators and runs', description: 'Actuators of a build and their calibration runs: what a rig posts.' },
  { name: 'Builds', description: 'Build logs: details, log entries and photos.' },
  { name: 'Parts registry', description: 'Salvaged parts with figures pooled from accepted runs.' },
  { name: 'Open data', description: 'The whole registry as files under the data licence.' },
  { name: 'Workbench', description: 'Pure calculations, open to anyone, nothing stored.' },
  { name: 'Account', description: 'My settings, the data licence and rig tokens.' },
  { name: 'Session', description: 'Signing in and out in a browser.' },
  { name: 'Exchange', description: 'Parts offered and wanted, and messages.' },
  { name: 'Comments', description: 'Questions and remarks on published builds.' },
  { name: 'Review threads', description: 'A build’s maker and the moderators, talking about its review.' },
  { name: 'Follows and notifications', description: 'Following builds, parts and makers; what you are told; mail choices.' },
  { name: 'Links and feeds', description: 'Share cards, Atom feeds, the sitemap and robots.txt.' },
  { name: 'Review', description: 'Moderation: the queue, decisions, reports and the audit log.' },
  { name: 'Admin', description: 'User roles and suspensions.' },
  { name: 'Service', description: 'Health and this document.' },
];
