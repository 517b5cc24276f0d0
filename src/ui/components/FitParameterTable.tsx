/** The fitted parameters: value with the digits its error supports, standard error, 95 % interval, what the data say, and the start. */
import type { FitParameterRow } from '../../state/fitView';

export function FitParameterTable({ rows, several }: { rows: FitParameterRow[]; several: boolean }) {
  return (
    <table className="data fit-table" data-testid="fit-table">
      <caption className="visually-hidden">Fitted parameters</caption>
      <thead>
        <tr>
          <th scope="col">Parameter</th>
          {several ? <th scope="col">Couple</th> : null}
          <th scope="col">Value</th>
          <th scope="col">± standard error</th>
          <th scope="col">95 % interval</th>
          <th scope="col" className="reading">What the data say</th>
          <th scope="col">Started from</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={`${r.key}|${r.couple ?? 'all'}`} data-testid={`fit-row-${r.key}${r.couple !== null && several ? `-${r.couple + 1}` : ''}`} className={`status-${r.status}`}>
            <th scope="row">{r.symbol}{r.unit ? <span className="unit"> / {r.unit}</span> : null}</th>
            {several ? <td>{r.couple === null ? 'all' : r.couple + 1}</td> : null}
            <td data-testid="value">{r.value || '—'}</td>
            <td data-testid="error">{r.error || '—'}</td>
            <td>{r.interval || '—'}</td>
            <td className="wrap">{r.reading}</td>
            <td>{r.start || '—'}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
