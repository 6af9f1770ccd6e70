import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import {
  useAddTestSets,
  useCompound,
  usePublishFit,
  useUpdateCompound,
} from '../../api/desk/compounds';
import type { CompoundDetail } from '../../api/desk/types';
import { CompoundForm } from '../../components/desk/compound/CompoundForm';
import { FitVersions } from '../../components/desk/compound/FitVersions';
import { TestSetTable } from '../../components/desk/compound/TestSetTable';
import { CsvImportPanel } from '../../components/desk/csv/CsvImportPanel';
import { DeskLayout } from '../../components/desk/DeskLayout';
import { formatNumber } from '../../components/desk/format';
import { QueryState } from '../../components/desk/QueryState';

function Details({ compound }: { compound: CompoundDetail }) {
  const update = useUpdateCompound(compound.id);
  const [editing, setEditing] = useState(false);
  if (editing) {
    return (
      <CompoundForm
        codeFixed
        initial={{ ...compound, bulkModulusMPa: compound.bulkModulusMPa ?? undefined }}
        submitLabel="Save details"
        onCancel={() => setEditing(false)}
        onSubmit={async ({ code: _code, ...changes }) => {
          await update.mutateAsync(changes);
          setEditing(false);
        }}
      />
    );
  }
  return (
    <section className="desk-card" aria-label="Compound details">
      <div className="desk-stats">
        <div className="desk-stat">
          family <strong>{compound.polymer}</strong>
        </div>
        <div className="desk-stat">
          nominal hardness <strong>{formatNumber(compound.hardnessShoreA, 3)} Shore A</strong>
        </div>
        <div className="desk-stat">
          bulk modulus K{' '}
          <strong>
            {compound.bulkModulusMPa ? `${formatNumber(compound.bulkModulusMPa)} MPa` : 'not given'}
          </strong>
        </div>
        <div className="desk-stat">
          current constants{' '}
          <strong>{compound.currentFit ? `v${compound.currentFit.version}` : 'none'}</strong>
        </div>
      </div>
      {compound.notes && <p>{compound.notes}</p>}
      <div className="desk-actions">
        <button type="button" onClick={() => setEditing(true)}>
          Edit details
        </button>
      </div>
    </section>
  );
}

function Compound({ compound }: { compound: CompoundDetail }) {
  const addSets = useAddTestSets(compound.id);
  const publish = usePublishFit(compound.id);
  return (
    <>
      <div className="desk-row desk-row--between">
        <h1>
          {compound.code} · {compound.name}
        </h1>
        <div className="desk-actions">
          <Link className="desk-button desk-primary" to={`/desk/compounds/${compound.id}/fit`}>
            Fit models
          </Link>
          <Link className="desk-button" to={`/desk/aging?compound=${compound.id}`}>
            Set and aging
          </Link>
        </div>
      </div>
      <Details compound={compound} />
      <h2>Test data</h2>
      <TestSetTable sets={compound.testSets} />
      <CsvImportPanel onSave={async (sets) => void (await addSets.mutateAsync(sets))} />
      <h2>Constant versions</h2>
      <FitVersions
        compound={compound}
        onPublish={(fitId, note) => publish.mutateAsync({ fitId, note })}
      />
    </>
  );
}

/** One compound: what it is, its lab tests, and the versions of its fitted constants. */
export default function CompoundPage() {
  const { compoundId } = useParams();
  const compound = useCompound(compoundId);
  return (
    <DeskLayout title="Compound">
      <QueryState query={compound} what="the compound">
        {(data) => <Compound compound={data} />}
      </QueryState>
    </DeskLayout>
  );
}
