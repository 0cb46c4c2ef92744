/**
 * The inputs, grouped as an installer works. On a wide screen every group is shown in one
 * column beside the results. On a phone or tablet (narrower than about 1000 px, the CSS media
 * query in smallScreens.css) the results come first and the inputs are reached one group at a
 * time through a row of large section buttons, with today's setting one tap away.
 */
import { type ReactNode, useState } from 'react';
import { CasesPanel } from './panels/CasesPanel.tsx';
import { InstallationPanel } from './panels/InstallationPanel.tsx';
import { LimitsPanel } from './panels/LimitsPanel.tsx';
import { LoadsPanel } from './panels/LoadsPanel.tsx';
import { SpanPanel } from './panels/SpanPanel.tsx';
import { WirePanel } from './panels/WirePanel.tsx';
import { TODAYS_SETTING_ID } from './sectionIds.ts';

const SECTIONS: { key: string; label: string; panel: ReactNode }[] = [
  { key: 'span', label: 'Span', panel: <SpanPanel /> },
  { key: 'wire', label: 'Wire', panel: <WirePanel /> },
  { key: 'loads', label: 'Loads', panel: <LoadsPanel /> },
  { key: 'installation', label: 'Installation', panel: <InstallationPanel /> },
  { key: 'weather', label: 'Weather', panel: <CasesPanel /> },
  { key: 'limits', label: 'Limits', panel: <LimitsPanel /> },
];

export function InputSections() {
  const [shown, setShown] = useState(SECTIONS[0].key);
  return (
    <>
      <nav className="section-switcher" aria-label="Input sections">
        {SECTIONS.map(({ key, label }) => (
          <button
            key={key}
            type="button"
            aria-pressed={shown === key}
            aria-controls={`inputs-${key}`}
            onClick={() => setShown(key)}
          >
            {label}
          </button>
        ))}
        <a className="button-link" href={`#${TODAYS_SETTING_ID}`}>
          Today's setting
        </a>
      </nav>
      {SECTIONS.map(({ key, panel }) => (
        <div key={key} id={`inputs-${key}`} className="input-section" data-shown={shown === key}>
          {panel}
        </div>
      ))}
    </>
  );
}
