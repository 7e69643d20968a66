// Everything only a signed-in person sees, in one module so Metro puts it in one chunk that the web app
// loads on demand (components/layout/lazy-screens.tsx). Keep it one chunk: Expo's serializer moves
// modules that two async chunks share into a common chunk that every page loads up front.
export { AppShell } from './app-shell';
export { MailList } from '@/components/admin/mail-list';
export { MailMessage } from '@/components/admin/mail-message';
export { UserList } from '@/components/admin/user-list';
export { FullAudit } from '@/components/audit/full-audit';
export { CaseloadView } from '@/components/caseload/caseload-view';
export { HistoryView } from '@/components/history/history-view';
export { MyPlanView } from '@/components/my-plan/my-plan-view';
export { PlanBuilderScreen } from '@/components/plan-builder/plan-builder-screen';
export { RecordView } from '@/components/record/record-view';
export { SharingView } from '@/components/sharing/sharing-view';
export { StudentClearanceView } from '@/components/teacher/student-clearance-view';
export { StudentList } from '@/components/teacher/student-list';
export { SessionScreen } from '@/components/today/session-screen';
export { TodayView } from '@/components/today/today-view';
