/**
 * The summary: the verdict first, in words and colour (with a mark, not colour alone), then
 * which case fails which check, then the governing numbers.
 */
import type { Summary as SummaryWords } from './summaryText.ts';

export function Summary({ summary }: { summary: SummaryWords }) {
  const tone = summary.pass ? 'pass' : 'fail';
  return (
    <div className={`summary summary-${tone}`} data-testid="summary" data-verdict={tone}>
      <p>
        <strong className="summary-verdict">
          <span aria-hidden="true">{summary.pass ? '✓ ' : '✗ '}</span>
          {summary.verdict}
        </strong>
        {summary.failures.length === 1 && ` ${summary.failures[0]}`}
      </p>
      {summary.failures.length > 1 && (
        <ul className="summary-failures">
          {summary.failures.map((line) => (
            <li key={line}>{line}</li>
          ))}
        </ul>
      )}
      {summary.detail && <p className="summary-detail">{summary.detail}</p>}
    </div>
  );
}
