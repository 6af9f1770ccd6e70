/** Edits of a table whose rows are typed in place: change one row's fields, or drop it. */
export function editableRows<T extends object>(rows: readonly T[], onChange: (rows: T[]) => void) {
  return {
    set: (index: number, patch: Partial<T>) =>
      onChange(rows.map((row, i) => (i === index ? { ...row, ...patch } : row))),
    remove: (index: number) => onChange(rows.filter((_, i) => i !== index)),
  };
}
