import { useId, useState } from 'react';

interface Props {
  onText(text: string, sourceName: string): void;
}

/** A lab file from disk, or text pasted straight from a spreadsheet. */
export function CsvSource({ onText }: Props) {
  const fileId = useId();
  const pasteId = useId();
  const [pasted, setPasted] = useState('');

  async function readFile(file: File | undefined) {
    if (!file) return;
    onText(await file.text(), file.name.replace(/\.[^.]+$/, ''));
  }

  return (
    <div className="desk-row desk-row--wrap desk-row--top">
      <div className="desk-field">
        <label htmlFor={fileId}>CSV file from the lab</label>
        <input
          id={fileId}
          type="file"
          accept=".csv,.txt,.tsv,text/csv,text/plain"
          onChange={(event) => void readFile(event.target.files?.[0])}
        />
      </div>
      <div className="desk-field desk-field--grow">
        <label htmlFor={pasteId}>…or paste the rows</label>
        <textarea
          id={pasteId}
          rows={4}
          value={pasted}
          placeholder={'mode,stretch,stress_MPa\nuniaxial,1.12,0.14'}
          onChange={(event) => setPasted(event.target.value)}
        />
        <button
          type="button"
          disabled={!pasted.trim()}
          onClick={() => onText(pasted, 'Pasted data')}
        >
          Read pasted rows
        </button>
      </div>
    </div>
  );
}
