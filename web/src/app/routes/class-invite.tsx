import { useParams } from 'react-router-dom';
import { InvitePage } from '@/features/class-join/components/invite-page';

/** The link in an invitation e-mail (inside RequireAuth: a signed-out visitor signs in and returns). */
export function ClassInviteRoute() {
  const { token = '' } = useParams();
  return <InvitePage key={token} token={token} />;
}
