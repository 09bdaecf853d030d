import { useParams } from 'react-router-dom';
import { useRecord } from '@/db/hooks';
import { BoatFile } from '@/features/boats/components/boat-file';
import { BoatDefects } from '@/features/defects/components/boat-defects';
import { BoatLog } from '@/features/patrol/components/boat-log';

/** The boat file, with the defects and patrol features' parts in their places. */
export function BoatFilePage() {
  const { boatId = '' } = useParams();
  const boat = useRecord('boat', boatId);
  const name = boat?.fields.name ?? 'this boat';
  return <BoatFile boatId={boatId} defects={<BoatDefects boatId={boatId} boatName={name} />} log={<BoatLog boatId={boatId} />} />;
}
