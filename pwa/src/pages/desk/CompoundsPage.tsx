import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { useCompounds, useCreateCompound } from '../../api/desk/compounds';
import { CompoundForm } from '../../components/desk/compound/CompoundForm';
import { DeskLayout } from '../../components/desk/DeskLayout';
import { formatNumber } from '../../components/desk/format';
import { modelLabel } from '../../components/desk/modelNames';
import { QueryState } from '../../components/desk/QueryState';
import { initialShearModulus } from '../../engine';

/** Every compound with the constants part specs pick up from it today. */
export default function CompoundsPage() {
  const compounds = useCompounds();
  const create = useCreateCompound();
  const navigate = useNavigate();
  const [adding, setAdding] = useState(false);

  return (
    <DeskLayout title="Compounds">
      <div className="desk-row desk-row--between">
        <h1>Compounds</h1>
        {!adding && (
          <button type="button" className="desk-primary" onClick={() => setAdding(true)}>
            New compound
          </button>
        )}
      </div>
      {adding && (
        <CompoundForm
          submitLabel="Create compound"
          onCancel={() => setAdding(false)}
          onSubmit={async (body) => {
            const made = await create.mutateAsync(body);
            navigate(`/desk/compounds/${made.id}`);
          }}
        />
      )}
      <QueryState query={compounds} what="the compounds">
        {(list) => (
          <table className="desk-table" aria-label="Compounds">
            <thead>
              <tr>
                <th scope="col">code</th>
                <th scope="col">name</th>
                <th scope="col">family</th>
                <th scope="col" className="num">
                  Shore A
                </th>
                <th scope="col">current constants</th>
                <th scope="col" className="num">
                  μ₀, MPa
                </th>
              </tr>
            </thead>
            <tbody>
              {list.map((compound) => (
                <tr key={compound.id}>
                  <td>
                    <Link to={`/desk/compounds/${compound.id}`}>{compound.code}</Link>
                  </td>
                  <td>{compound.name}</td>
                  <td>{compound.polymer}</td>
                  <td className="num">{formatNumber(compound.hardnessShoreA, 3)}</td>
                  <td>
                    {compound.currentFit
                      ? `v${compound.currentFit.version} · ${modelLabel(compound.currentFit.model)}`
                      : 'none published yet'}
                  </td>
                  <td className="num">
                    {compound.currentFit
                      ? formatNumber(initialShearModulus(compound.currentFit.model))
                      : '–'}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </QueryState>
    </DeskLayout>
  );
}
