import { use, type ComponentType } from 'react';

type Screens = import('./signed-in-screens').SignedInScreens;
type ScreenName = { [K in keyof Screens]: Screens[K] extends ComponentType<never> ? K : never }[keyof Screens];

let loaded: Screens | undefined;
let pending: Promise<Screens> | undefined;

/**
 * Starts (once) the download of the signed-in screens. A first visit, nearly always to sign-in, then
 * downloads and runs only what sign-in needs; the session gate calls this before it asks who is signed
 * in, so both travel at the same time. A failed download is forgotten, so the next render tries again.
 */
export function loadSignedInScreens(): Promise<Screens> {
  pending ??= import('./signed-in-screens').then((chunk) => chunk.openSignedInScreens()).then(
    (module) => (loaded = module),
    (error: unknown) => {
      pending = undefined;
      throw error;
    },
  );
  return pending;
}

/**
 * A stand-in for one signed-in screen: suspends (to the nearest Suspense, in the session gate) until the
 * chunk is in, then renders the real component synchronously on every later render and navigation,
 * which React.lazy would not: it suspends once per component, a flash of the fallback per first visit.
 */
function screen<K extends ScreenName>(name: K): Screens[K] {
  function SignedInScreen(props: object) {
    const screens = loaded ?? use(loadSignedInScreens());
    const Component = screens[name] as ComponentType<object>;
    return <Component {...props} />;
  }
  SignedInScreen.displayName = `Lazy(${name})`;
  // Same props as the real component: the stand-in only forwards them.
  return SignedInScreen as unknown as Screens[K];
}

export const AppShell = screen('AppShell');
export const CaseloadView = screen('CaseloadView');
export const FullAudit = screen('FullAudit');
export const HistoryView = screen('HistoryView');
export const MailList = screen('MailList');
export const MailMessage = screen('MailMessage');
export const MyPlanView = screen('MyPlanView');
export const PlanBuilderScreen = screen('PlanBuilderScreen');
export const RecordView = screen('RecordView');
export const SessionScreen = screen('SessionScreen');
export const SharingView = screen('SharingView');
export const StudentClearanceView = screen('StudentClearanceView');
export const StudentList = screen('StudentList');
export const TodayView = screen('TodayView');
export const UserList = screen('UserList');
