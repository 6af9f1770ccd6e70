import { useNavigate } from 'react-router-dom';
import { usePresses } from '../../api/desk/lots';
import { useSpecs } from '../../api/desk/specs';
import { useReviewQueue } from '../../api/review';
import type { Lot } from '../../api/types';
import { QueryState } from '../../components/desk/QueryState';
import { Screen } from '../../components/Screen';
import { when } from '../../components/time';

/** Flagged lots without a disposition, oldest flag first: the supervisor's work list. */
export function ReviewQueuePage() {
  const queue = useReviewQueue();
  const presses = usePresses();
  const specs = useSpecs();
  const navigate = useNavigate();
  const pressCode = (id: string) => presses.data?.find((p) => p.id === id)?.code ?? '…';
  const part = (id: string) => specs.data?.find((s) => s.id === id)?.partNumber ?? '…';
  const byFlag = (lots: Lot[]) =>
    [...lots].sort((a, b) => (a.flaggedAt ?? '').localeCompare(b.flaggedAt ?? ''));

  return (
    <Screen title="Flagged lots">
      <QueryState query={queue} what="the flagged lots">
        {(lots) =>
          lots.length === 0 ? (
            <p className="empty-note">No flagged lot is waiting for a decision.</p>
          ) : (
            <table className="data-table" data-testid="review-queue">
              <thead>
                <tr>
                  <th>Lot</th>
                  <th>Part</th>
                  <th>Press</th>
                  <th>Cavity</th>
                  <th className="num">Bad / reject at</th>
                  <th>Flagged</th>
                </tr>
              </thead>
              <tbody>
                {byFlag(lots).map((lot) => (
                  <tr
                    key={lot.id}
                    className="row-link"
                    tabIndex={0}
                    onClick={() => navigate(`/review/${lot.id}`)}
                    onKeyDown={(event) => event.key === 'Enter' && navigate(`/review/${lot.id}`)}
                  >
                    <td>
                      <strong>{lot.lotNumber}</strong>
                    </td>
                    <td>{part(lot.specId)}</td>
                    <td>{pressCode(lot.pressId)}</td>
                    <td>{lot.cavity}</td>
                    <td className="num">
                      {lot.nonconforming} / {lot.plan.reject}
                    </td>
                    <td>{when(lot.flaggedAt)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          )
        }
      </QueryState>
    </Screen>
  );
}
