import { useLiveQuery } from 'dexie-react-hooks';
import { db } from '../../offline/db';
import type { LotRecords } from '../../offline/catalog';
import type { LocalDefect } from '../../offline/records';
import { defectLabel } from '../../inspect/defects';
import { useBlobUrl } from '../useBlobUrl';
import { RecordState } from './RecordState';

function Thumbnail({ sha256 }: { sha256: string }) {
  const photo = useLiveQuery(() => db.photos.get(sha256), [sha256]);
  const url = useBlobUrl(photo?.blob, sha256);
  if (!url) return null;
  return <img className="defect-thumb" src={url} alt="Defect photo" data-testid="defect-thumb" />;
}

function partName(defect: LocalDefect, records: LotRecords): string {
  const sample = defect.partId ? records.sampleOf.get(defect.partId) : undefined;
  return sample === undefined ? 'not on a sampled part' : `part ${sample}`;
}

export function DefectList({ records }: { records: LotRecords }) {
  if (records.defects.length === 0) return <p>No defect logged.</p>;
  return (
    <ul className="defect-list">
      {records.defects.map((defect) => (
        <li key={defect.id}>
          {defect.photoSha256 && <Thumbnail sha256={defect.photoSha256} />}
          <div>
            <strong>{defectLabel(defect.type)}</strong> — {defect.severity}, {defect.location},{' '}
            {partName(defect, records)}
            {defect.note && <p>{defect.note}</p>}
            <RecordState op={records.ops.get(defect.id)} />
          </div>
        </li>
      ))}
    </ul>
  );
}
