import { useParams } from 'react-router-dom';
import { DefectFile } from '@/features/defects/components/defect-file';

export function DefectFilePage() {
  const { defectId = '' } = useParams();
  return <DefectFile defectId={defectId} />;
}
