import { useNavigate, useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { DefectForm } from '@/features/defects/components/defect-form';
import { paths } from '../paths';

export function DefectNewPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  return (
    <>
      <PageHeader title="Report a defect" subtitle="Saved on this phone at once, sent to the club when there is signal" />
      <DefectForm boatId={params.get('boat') ?? undefined} onSaved={(id) => navigate(paths.defectFile.href(id), { replace: true })} />
    </>
  );
}
