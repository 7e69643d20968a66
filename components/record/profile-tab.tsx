import { useProfileQuery } from '@/hooks/use-record';
import { useMusicianSharesQuery } from '@/hooks/use-shares';
import { ShareList } from '@/components/sharing/share-list';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Section } from '@/components/ui/section';
import { NotesSection } from './notes-section';
import { ProblemForm } from './problem-form';
import { TwoPanes } from './two-panes';

/** Who the musician is, what brought them, private notes, and who sees their clearance. */
export function ProfileTab({ id }: { id: string }) {
  const profile = useProfileQuery(id);
  const shares = useMusicianSharesQuery(id);
  const main = (
    <Section title="Profile and presenting problem" description="For you only: never shown to a teacher or sent by e-mail." testID="record-profile">
      {profile.isPending ? <LoadingState label="Loading the profile…" /> : null}
      {profile.isError ? <ErrorState error={profile.error} onRetry={() => profile.refetch()} testID="profile-error" /> : null}
      {profile.data ? (
        <Card>
          <ProblemForm key={profile.data.id} id={id} profile={profile.data} />
        </Card>
      ) : null}
    </Section>
  );
  const side = (
    <>
      <NotesSection id={id} />
      <Section title="Shares clearance with" description="Teachers see cleared repertoire and playing limits only, never medical detail." testID="record-shares">
        {shares.isPending ? <LoadingState label="Loading…" /> : null}
        {shares.isError ? <ErrorState error={shares.error} testID="shares-error" /> : null}
        {shares.data ? <ShareList shares={shares.data} empty="The musician does not share their clearance with anyone yet." testID="record-share-list" /> : null}
      </Section>
    </>
  );
  return <TwoPanes main={main} side={side} />;
}
