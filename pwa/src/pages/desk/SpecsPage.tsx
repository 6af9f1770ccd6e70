import { useId, useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { useCompounds } from '../../api/desk/compounds';
import { useCreateSpec, useSpecs } from '../../api/desk/specs';
import { DeskLayout } from '../../components/desk/DeskLayout';
import { formatDate } from '../../components/desk/format';
import { QueryState } from '../../components/desk/QueryState';
import { SHAPE_NAMES } from '../../components/desk/spec/specForm';
import { ErrorAlert } from '../../components/desk/ErrorAlert';

function NewSpecForm({ onDone }: { onDone(): void }) {
  const id = useId();
  const create = useCreateSpec();
  const navigate = useNavigate();
  const [partNumber, setPartNumber] = useState('');
  const [name, setName] = useState('');
  const [description, setDescription] = useState('');
  return (
    <form
      className="desk-card"
      onSubmit={async (event) => {
        event.preventDefault();
        const made = await create.mutateAsync({
          partNumber: partNumber.trim(),
          name: name.trim(),
          description: description.trim(),
        });
        navigate(`/desk/specs/${made.id}`);
      }}
    >
      <div className="desk-grid desk-grid--4">
        <div className="desk-field">
          <label htmlFor={`${id}-pn`}>Part number</label>
          <input
            id={`${id}-pn`}
            value={partNumber}
            onChange={(e) => setPartNumber(e.target.value)}
          />
        </div>
        <div className="desk-field">
          <label htmlFor={`${id}-name`}>Name</label>
          <input id={`${id}-name`} value={name} onChange={(e) => setName(e.target.value)} />
        </div>
      </div>
      <div className="desk-field">
        <label htmlFor={`${id}-desc`}>Description</label>
        <textarea
          id={`${id}-desc`}
          rows={2}
          value={description}
          onChange={(e) => setDescription(e.target.value)}
        />
      </div>
      {create.isError && <ErrorAlert>{create.error.message}</ErrorAlert>}
      <div className="desk-actions">
        <button
          type="submit"
          className="desk-primary"
          disabled={!partNumber.trim() || !name.trim() || create.isPending}
        >
          Create part spec
        </button>
        <button type="button" onClick={onDone}>
          Cancel
        </button>
      </div>
    </form>
  );
}

/** Every part spec with the revision inspectors check against today. */
export default function SpecsPage() {
  const specs = useSpecs();
  const compounds = useCompounds();
  const [adding, setAdding] = useState(false);
  return (
    <DeskLayout title="Part specs">
      <div className="desk-row desk-row--between">
        <h1>Part specs</h1>
        {!adding && (
          <button type="button" className="desk-primary" onClick={() => setAdding(true)}>
            New part spec
          </button>
        )}
      </div>
      {adding && <NewSpecForm onDone={() => setAdding(false)} />}
      <QueryState query={specs} what="the part specs">
        {(list) => (
          <table className="desk-table" aria-label="Part specs">
            <thead>
              <tr>
                <th scope="col">part number</th>
                <th scope="col">name</th>
                <th scope="col">in use</th>
                <th scope="col">shape</th>
                <th scope="col">compound</th>
                <th scope="col">released</th>
              </tr>
            </thead>
            <tbody>
              {list.map((spec) => {
                const current = spec.currentRevision;
                const compound = compounds.data?.find((c) => c.id === current?.body.compoundId);
                return (
                  <tr key={spec.id}>
                    <td>
                      <Link to={`/desk/specs/${spec.id}`}>{spec.partNumber}</Link>
                    </td>
                    <td>{spec.name}</td>
                    <td>{current ? `rev ${current.revision}` : 'nothing released'}</td>
                    <td>
                      {current
                        ? `${SHAPE_NAMES[current.body.geometry.shape]}${current.body.bonded ? ', bonded' : ''}`
                        : '–'}
                    </td>
                    <td>{compound?.code ?? '–'}</td>
                    <td>{formatDate(current?.releasedAt)}</td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        )}
      </QueryState>
    </DeskLayout>
  );
}
