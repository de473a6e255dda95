import { DataTable } from '@/components/ui/data-table';

export interface ChartNumbersProps {
  /** Names the table; also what the disclosure says. */
  caption: string;
  columns: readonly { label: string; numeric?: boolean }[];
  rows: readonly (readonly string[])[];
  testId?: string;
}

/**
 * A chart's text alternative: the numbers it draws, as a table behind a disclosure under the figure. It stays in the
 * page when closed, so screen readers and printouts have it too.
 */
export function ChartNumbers({ caption, columns, rows, testId }: ChartNumbersProps) {
  return (
    <details className="mt-2 text-sm" data-testid={testId}>
      <summary className="cursor-pointer text-accent underline print:hidden">{caption}</summary>
      <div className="mt-2">
        <DataTable caption={caption} columns={columns}>
          {rows.map((row, i) => (
            <tr key={i} className="border-b border-paper-edge">
              {row.map((cell, j) => (
                j === 0 ? <th key={j} scope="row" className="py-1 pr-3 text-left font-normal">{cell}</th> : <td key={j} className={`py-1 ${j < row.length - 1 ? 'pr-3' : ''} ${columns[j]?.numeric ? 'num text-right' : ''}`}>{cell}</td>
              ))}
            </tr>
          ))}
        </DataTable>
      </div>
    </details>
  );
}
