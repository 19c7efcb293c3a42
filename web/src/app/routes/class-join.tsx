import { useSearchParams } from 'react-router-dom';
import { JoinCodePage } from '@/features/class-join/components/join-code-page';

/** /classes/join, or /classes/join?code=WXYZ2345 from a link the instructor shared. */
export function ClassJoinRoute() {
  const [params] = useSearchParams();
  return <JoinCodePage initialCode={params.get('code') ?? ''} />;
}
