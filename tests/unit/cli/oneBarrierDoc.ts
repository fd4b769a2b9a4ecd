/** Invented profile for the CLI's uncertainty tests: one step, barrier 20 ± 1 kcal/mol, as .passline text. */
export const ONE_BARRIER_DOC = JSON.stringify({
  format: 'passline', version: 2, title: 'one uncertain barrier',
  pathways: [{ id: 'a', name: 'A', points: [
    { id: 'r', label: 'R', kind: 'min', energy: { mode: 'value', value: 0, unit: 'kcal/mol' } },
    { id: 't', label: 'TS', kind: 'ts', energy: { mode: 'barrier', value: 20, unit: 'kcal/mol', sigma: 1 } },
    { id: 'p', label: 'P', kind: 'min', energy: { mode: 'value', value: -5, unit: 'kcal/mol' } },
  ] }],
});
