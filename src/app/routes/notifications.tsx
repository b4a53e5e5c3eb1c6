import { PageHeader } from '@/components/ui/page-header.tsx';
import { SignInFirst } from '@/components/ui/load-states.tsx';
import { useSession } from '@/features/session/api/get-session.ts';
import { NotificationList } from '@/features/notifications/components/notification-list.tsx';
import { FollowingList } from '@/features/notifications/components/following-list.tsx';

const TITLE = 'Notifications';

/** /notifications: what I was told (newest first) and what I follow. */
export function NotificationsPage() {
  const { data: session } = useSession();
  if (!session?.user) return <SignInFirst title={TITLE} />;
  return (
    <div className="space-y-8">
      <PageHeader
        title={TITLE}
        lead="Decisions on your work, review-thread posts, comments on your builds, and news from what you follow."
      />
      <NotificationList />
      <FollowingList />
    </div>
  );
}
