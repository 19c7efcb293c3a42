import { ClassesPage } from '@/features/classroom/components/classes-page';

/** Classes the baker teaches or is in. */
export function ClassesRoute() {
  return <ClassesPage />;
}
