// Everything only a signed-in person sees. Reached only through signed-in-screens.ts, the chunk the web
// app loads on demand, so Metro puts all of it in that chunk.
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
