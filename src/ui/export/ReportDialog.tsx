/**
 * The PDF report dialog: the client and site block the person fills in (remembered in this
 * browser) and the paper size. The report itself is built by the deliverables layer.
 */
import { type RefObject, useId, useState } from 'react';
import type { PaperSize, ReportDetails } from '../../deliverables/pdfReport.ts';
import { useModal } from './useModal.ts';

const DETAILS_KEY = 'sagwright:report-details';
const EMPTY: ReportDetails = { client: '', site: '', preparedBy: '', reference: '' };
const FIELDS: [keyof ReportDetails, string][] = [
  ['client', 'Client'],
  ['site', 'Site'],
  ['preparedBy', 'Prepared by'],
  ['reference', 'Reference'],
];

function storedDetails(): ReportDetails {
  try {
    const parsed = JSON.parse(localStorage.getItem(DETAILS_KEY) ?? '{}') as Partial<ReportDetails>;
    const pick = (key: keyof ReportDetails) =>
      typeof parsed[key] === 'string' ? parsed[key].slice(0, 200) : '';
    return {
      client: pick('client'),
      site: pick('site'),
      preparedBy: pick('preparedBy'),
      reference: pick('reference'),
    };
  } catch {
    return EMPTY;
  }
}

export function ReportDialog({
  busy,
  onCreate,
  onClose,
  returnFocus,
}: {
  busy: boolean;
  onCreate: (paper: PaperSize, details: ReportDetails) => void;
  onClose: () => void;
  returnFocus?: RefObject<HTMLElement | null>;
}) {
  const modal = useModal(onClose, returnFocus);
  const [details, setDetails] = useState(storedDetails);
  const [paper, setPaper] = useState<PaperSize>(() =>
    navigator.language === 'en-US' ? 'letter' : 'a4',
  );
  const id = useId();
  const submit = (event: React.FormEvent) => {
    event.preventDefault();
    try {
      localStorage.setItem(DETAILS_KEY, JSON.stringify(details));
    } catch {
      // not remembered; the report is still made
    }
    onCreate(paper, details);
  };
  return (
    <dialog
      ref={modal.ref}
      onCancel={modal.onCancel}
      className="export-dialog"
      aria-labelledby={`${id}-title`}
    >
      <form onSubmit={submit}>
        <h2 id={`${id}-title`}>PDF report</h2>
        {FIELDS.map(([key, label]) => (
          <label key={key}>
            {label}
            <input
              value={details[key]}
              maxLength={200}
              onChange={(event) => setDetails({ ...details, [key]: event.target.value })}
            />
          </label>
        ))}
        <fieldset>
          <legend>Paper</legend>
          {(['a4', 'letter'] as const).map((size) => (
            <label key={size}>
              <input
                type="radio"
                name={`${id}-paper`}
                checked={paper === size}
                onChange={() => setPaper(size)}
              />
              {size === 'a4' ? 'A4' : 'US Letter'}
            </label>
          ))}
        </fieldset>
        <div className="export-dialog-actions">
          <button type="submit" disabled={busy}>
            {busy ? 'Making the report…' : 'Create PDF'}
          </button>
          <button type="button" onClick={onClose}>
            Cancel
          </button>
        </div>
      </form>
    </dialog>
  );
}
