/** The summary line: the verdict first, in words and colour (with a mark, not colour alone). */
import type { Summary as SummaryWords } from './summaryText.ts';

export function Summary({ summary }: { summary: SummaryWords }) {
  const tone = summary.pass ? 'pass' : 'fail';
  return (
    <p className={`summary summary-${tone}`} data-testid="summary" data-verdict={tone}>
      <strong className="summary-verdict">
        <span aria-hidden="true">{summary.pass ? '✓ ' : '✗ '}</span>
        {summary.verdict}
      </strong>{' '}
      <span className="summary-detail">{summary.detail}</span>
    </p>
  );
}
