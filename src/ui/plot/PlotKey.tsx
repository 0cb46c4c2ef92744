/**
 * The key to a narrow plot, under it and folded by default: what each line, fill and mark is,
 * from the same traces the plot draws (those the legend would show). It wraps like text, so on
 * a phone it never takes the plot's height the way a dozen legend rows would.
 */
import type { Data } from 'plotly.js';

interface KeyEntry {
  name: string;
  colour: string;
  dash: string;
  kind: 'line' | 'fill' | 'mark';
}

const DASHES: Record<string, string> = { dash: '6 4', dot: '2 3', dashdot: '6 3 2 3' };

/** Plotly's text (plotlyText) back to the characters typed. */
function plain(text: string): string {
  return text.replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&amp;/g, '&');
}

function entries(data: Data[]): KeyEntry[] {
  const seen = new Set<string>();
  const out: KeyEntry[] = [];
  for (const trace of data) {
    const t = trace as {
      name?: string;
      showlegend?: boolean;
      mode?: string;
      fill?: string;
      fillcolor?: string;
      line?: { color?: string; dash?: string };
      marker?: { color?: string };
    };
    if (!t.name || t.showlegend === false || seen.has(t.name)) continue;
    seen.add(t.name);
    const mark = !t.mode?.includes('lines');
    out.push({
      name: plain(t.name),
      colour: (mark ? t.marker?.color : t.fill ? t.fillcolor : t.line?.color) ?? '#333333',
      dash: DASHES[t.line?.dash ?? ''] ?? '',
      kind: mark ? 'mark' : t.fill ? 'fill' : 'line',
    });
  }
  return out;
}

function Swatch({ entry }: { entry: KeyEntry }) {
  return (
    <svg width="28" height="12" viewBox="0 0 28 12" aria-hidden="true" focusable="false">
      {entry.kind === 'fill' && (
        <rect x="1" y="1" width="26" height="10" fill={entry.colour} stroke="#6b5a3c" />
      )}
      {entry.kind === 'line' && (
        <line
          x1="1"
          y1="6"
          x2="27"
          y2="6"
          stroke={entry.colour}
          strokeWidth="2.5"
          strokeDasharray={entry.dash || undefined}
        />
      )}
      {entry.kind === 'mark' && <path d="M8,2 H20 L14,11 Z" fill={entry.colour} />}
    </svg>
  );
}

export function PlotKey({ data }: { data: Data[] }) {
  const list = entries(data);
  if (list.length === 0) return null;
  return (
    <details className="plot-key">
      <summary>Key to the plot</summary>
      <ul>
        {list.map((entry) => (
          <li key={entry.name}>
            <Swatch entry={entry} />
            {entry.name}
          </li>
        ))}
      </ul>
    </details>
  );
}
