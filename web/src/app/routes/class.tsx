import { useParams } from 'react-router-dom';
import { ClassPage } from '@/features/classroom/components/class-page';

/** One class: the instructor's roster, chart, invitations and join code; a student's plain class page. */
export function ClassRoute() {
  const { classId = '' } = useParams();
  return <ClassPage key={classId} classId={classId} />;
}
