import { PageHeader } from '@/components/page-header';
import { DefectList } from '@/features/defects/components/defect-list';

export function DefectsPage() {
  return (
    <>
      <PageHeader title="Defects" subtitle="Reported faults and what was done about them" />
      <DefectList />
    </>
  );
}
