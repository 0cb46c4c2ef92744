/** Weather cases: a small editable table (name, temperature, ice, wind, loads on), add/duplicate/delete. */
import { unitSymbol } from '../../core/units.ts';
import * as edits from '../../state/projectEdits.ts';
import { useProjectStore } from '../../state/projectStore.ts';
import { useUiStore } from '../../state/uiStore.ts';
import { applyEdit, CheckField } from '../fields/ChoiceFields.tsx';
import { NumberField } from '../fields/NumberField.tsx';
import { TextField } from '../fields/TextField.tsx';

export function CasesPanel() {
  const cases = useProjectStore((s) => s.project.cases);
  const units = useUiStore((s) => s.unitSystem);
  return (
    <section className="panel" aria-labelledby="cases-heading">
      <h2 id="cases-heading">Weather cases</h2>
      <table className="edit-table cases-table" aria-labelledby="cases-heading">
        <thead>
          <tr>
            <th scope="col">Name</th>
            {/* A soft hyphen lets the long word break, so the table fits a laptop's panel. */}
            <th scope="col">
              Temper{'\u00AD'}ature ({unitSymbol('temperature', units)})
            </th>
            <th scope="col">Ice ({unitSymbol('diameter', units)})</th>
            <th scope="col">Wind ({unitSymbol('speed', units)})</th>
            <th scope="col">Loads on</th>
            <th scope="col">
              <span className="visually-hidden">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {cases.map((weather, i) => {
            const path = `cases[${i}]`;
            const name = weather.name;
            return (
              // biome-ignore lint/suspicious/noArrayIndexKey: rows are positions in the list
              <tr key={i}>
                <td>
                  <TextField
                    compact
                    path={`${path}.name`}
                    label={`Case ${i + 1} name`}
                    value={name}
                    edit={(text) => edits.patchCase(i, { name: text })}
                  />
                </td>
                <td>
                  <NumberField
                    compact
                    path={`${path}.temperature`}
                    label={`${name} temperature`}
                    quantity="temperature"
                    value={weather.temperature}
                    edit={(temperature) => edits.patchCase(i, { temperature })}
                  />
                </td>
                <td>
                  <NumberField
                    compact
                    path={`${path}.iceThickness`}
                    label={`${name} ice thickness`}
                    quantity="diameter"
                    value={weather.iceThickness}
                    edit={(iceThickness) => edits.patchCase(i, { iceThickness })}
                  />
                </td>
                <td>
                  <NumberField
                    compact
                    path={`${path}.windSpeed`}
                    label={`${name} wind speed`}
                    quantity="speed"
                    value={weather.windSpeed}
                    edit={(windSpeed) => edits.patchCase(i, { windSpeed })}
                  />
                </td>
                <td>
                  <CheckField
                    compact
                    label={`${name} with hung loads`}
                    checked={weather.withLoads}
                    edit={(withLoads) => edits.patchCase(i, { withLoads })}
                  />
                </td>
                <td className="row-actions">
                  <button
                    type="button"
                    aria-label={`Duplicate ${name}`}
                    onClick={() => applyEdit(edits.duplicateCase(i), `Duplicate ${name}`)}
                  >
                    Copy
                  </button>
                  <button
                    type="button"
                    aria-label={`Delete ${name}`}
                    onClick={() => applyEdit(edits.removeCase(i), `Delete ${name}`)}
                  >
                    Delete
                  </button>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <button type="button" onClick={() => applyEdit(edits.addCase(), 'Add a weather case')}>
        Add a weather case
      </button>
    </section>
  );
}
