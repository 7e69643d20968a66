// The chunk of everything only a signed-in person sees: the web app loads it on demand
// (components/layout/lazy-screens.tsx). Keep it one chunk: Expo's serializer moves modules that two async
// chunks share into a common chunk that every page loads up front.
import { startInSteps } from '@/lib/start-in-steps';

/* eslint-disable @typescript-eslint/no-require-imports -- each step runs its modules when it is called. */

export type SignedInScreens = typeof import('./signed-in-screen-list');

/**
 * Runs the chunk's modules a screen at a time, the browser given its main thread in between (as the
 * app's own start, index.ts), then hands over the screens. Today's comes first: it is the one most opened.
 */
export async function openSignedInScreens(): Promise<SignedInScreens> {
  await startInSteps([
    () => require('./app-shell'),
    () => require('@/components/today/today-view'),
    () => require('@/components/today/session-screen'),
    () => require('@/components/my-plan/my-plan-view'),
    () => require('@/components/history/history-view'),
    () => require('@/components/sharing/sharing-view'),
    () => require('@/components/caseload/caseload-view'),
    () => require('@/components/record/record-view'),
    () => require('@/components/plan-builder/plan-builder-screen'),
    () => require('@/components/teacher/student-list'),
    () => require('@/components/teacher/student-clearance-view'),
    () => require('@/components/admin/user-list'),
    () => require('@/components/admin/mail-list'),
    () => require('@/components/admin/mail-message'),
    () => require('@/components/audit/full-audit'),
  ]);
  return require('./signed-in-screen-list');
}
