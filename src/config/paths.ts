/** Every client URL in one place, so links and routes cannot drift apart. */
export const paths = {
  home: '/',
  builds: '/builds',
  myBuilds: '/builds/mine',
  newBuild: '/builds/new',
  build: (id: number) => `/builds/${id}`,
  editBuild: (id: number) => `/builds/${id}/edit`,
  parts: '/parts',
  exchange: '/exchange',
  workbench: '/workbench',
  workbenchTool: (slug: string) => `/workbench/${slug}`,
  review: '/review',
  admin: '/admin',
  signIn: (returnTo?: string) => `/auth/github${returnTo ? `?returnTo=${encodeURIComponent(returnTo)}` : ''}`,
} as const;
