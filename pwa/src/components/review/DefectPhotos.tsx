import { usePhotoUrl } from '../../api/review';
import type { Defect, Inspection } from '../../api/types';
import { defectLabel } from '../../inspect/defects';

function Photo({ sha256 }: { sha256: string }) {
  const url = usePhotoUrl(sha256);
  if (!url) return <div className="defect-thumb">…</div>;
  return (
    <a href={url} target="_blank" rel="noreferrer">
      <img className="defect-photo" src={url} alt="Defect" data-testid="server-photo" />
    </a>
  );
}

/** The lot's defects as the server has them, with their photos fetched under the person's token. */
export function DefectPhotos({
  defects,
  inspections,
}: {
  defects: Defect[];
  inspections: Inspection[];
}) {
  if (defects.length === 0) return <p>No defect logged.</p>;
  const sampleOf = (id: string | null) => inspections.find((i) => i.id === id)?.sampleIndex;
  return (
    <ul className="defect-list">
      {defects.map((defect) => (
        <li key={defect.id}>
          {defect.photoSha256 && <Photo sha256={defect.photoSha256} />}
          <div>
            <strong>{defectLabel(defect.type)}</strong> — {defect.severity}, {defect.location}
            {sampleOf(defect.inspectionId) !== undefined &&
              `, part ${sampleOf(defect.inspectionId)}`}
            {defect.sizeMm !== null && `, ${defect.sizeMm} mm`}
            {defect.note && <p>{defect.note}</p>}
          </div>
        </li>
      ))}
    </ul>
  );
}
