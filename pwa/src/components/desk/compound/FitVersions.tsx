import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { CompoundDetail, FitRecord } from '../../../api/desk/types';
import { initialShearModulus } from '../../../engine';
import { formatDate, formatNumber } from '../format';
import { modelLabel } from '../modelNames';
import { PublishForm } from './PublishForm';

interface Props {
  compound: CompoundDetail;
  onPublish(fitId: string, note: string): Promise<unknown>;
}

function status(fit: FitRecord, currentFitId: string | null): string {
  if (fit.id === currentFitId) return 'current';
  return fit.status === 'published' ? 'earlier' : 'draft';
}

/** Every stored fit, newest first: which one part specs take, and drafts waiting to be published. */
export function FitVersions({ compound, onPublish }: Props) {
  const [publishing, setPublishing] = useState<string | null>(null);
  const fits = [...compound.fits].sort((a, b) => b.version - a.version);
  if (fits.length === 0) return <p className="desk-muted">No fits stored yet.</p>;
  return (
    <table className="desk-table" aria-label="Constant versions">
      <thead>
        <tr>
          <th scope="col">version</th>
          <th scope="col">model</th>
          <th scope="col">state</th>
          <th scope="col" className="num">
            μ₀, MPa
          </th>
          <th scope="col">published</th>
          <th scope="col">note</th>
          <th scope="col" />
        </tr>
      </thead>
      <tbody>
        {fits.map((fit) => {
          const state = status(fit, compound.currentFitId);
          return (
            <tr key={fit.id} className={state === 'current' ? 'desk-selected' : undefined}>
              <td>v{fit.version}</td>
              <td>{modelLabel(fit.model)}</td>
              <td>
                <span
                  className={`desk-badge desk-badge--${state === 'draft' ? 'draft' : 'published'}`}
                >
                  {state}
                </span>
              </td>
              <td className="num">{formatNumber(initialShearModulus(fit.model))}</td>
              <td>{formatDate(fit.publishedAt)}</td>
              <td>{fit.note ?? ''}</td>
              <td>
                <div className="desk-actions">
                  <Link
                    className="desk-button"
                    to={`/desk/reports/compounds/${compound.id}/fits/${fit.id}`}
                  >
                    Fit report
                  </Link>
                  {fit.status === 'draft' &&
                    (publishing === fit.id ? (
                      <PublishForm
                        onCancel={() => setPublishing(null)}
                        onPublish={async (note) => {
                          await onPublish(fit.id, note);
                          setPublishing(null);
                        }}
                      />
                    ) : (
                      <button type="button" onClick={() => setPublishing(fit.id)}>
                        Publish…
                      </button>
                    ))}
                </div>
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
