/** The span: fixings (position, height, name), the ground line and clearance zones. */
import { ATTACHMENTS, type Attachment, type Project } from '../../core/index.ts';
import { ATTACHMENT_CHOICE } from '../../deliverables/attachmentWords.ts';
import * as edits from '../../state/projectEdits.ts';
import { useProjectStore } from '../../state/projectStore.ts';
import { applyEdit, SelectField } from '../fields/ChoiceFields.tsx';
import { NumberField } from '../fields/NumberField.tsx';
import { TextField } from '../fields/TextField.tsx';
import { Row } from './Row.tsx';

const ATTACHMENT_OPTIONS = ATTACHMENTS.map((value) => ({
  value,
  label: ATTACHMENT_CHOICE[value],
}));

function Supports({ project }: { project: Project }) {
  const count = project.supports.length;
  return (
    <fieldset>
      <legend>Fixings</legend>
      {project.supports.map((support, i) => {
        const path = `supports[${i}]`;
        const name = support.label || `Fixing ${i + 1}`;
        return (
          // biome-ignore lint/suspicious/noArrayIndexKey: rows are positions in the list
          <Row key={i} label={`Fixing ${i + 1}`}>
            <TextField
              path={`${path}.label`}
              context={`Fixing ${i + 1}`}
              label="Name"
              value={support.label ?? ''}
              edit={(label) => edits.patchSupport(i, { label })}
            />
            <NumberField
              path={`${path}.x`}
              context={name}
              label="Position"
              quantity="length"
              value={support.x}
              edit={(x) => edits.patchSupport(i, { x })}
            />
            <NumberField
              path={`${path}.z`}
              context={name}
              label="Height"
              quantity="length"
              value={support.z}
              edit={(z) => edits.patchSupport(i, { z })}
            />
            {i > 0 && i < count - 1 && (
              <SelectField<Attachment>
                label="Holds the wire"
                context={name}
                value={support.attachment ?? 'clamped'}
                options={ATTACHMENT_OPTIONS}
                edit={(attachment) =>
                  edits.patchSupport(i, {
                    attachment: attachment === 'clamped' ? undefined : attachment,
                  })
                }
              />
            )}
            {count > 2 && (
              <button
                type="button"
                onClick={() =>
                  applyEdit(edits.removeSupport(i), `Remove ${name}`, { removedSupport: i })
                }
              >
                Remove {name}
              </button>
            )}
          </Row>
        );
      })}
      {count > 2 && (
        <p className="muted">
          A fixing between spans holds the wire clamped (each span keeps its own length of wire),
          over a pulley or smooth eye (the wire slides through: the same tension on both sides) or
          on a swing link (a hanging link that swings along the line: the same horizontal pull on
          both sides).
        </p>
      )}
      <button
        type="button"
        onClick={() => applyEdit(edits.addSupport(), 'Add a fixing at the far end')}
      >
        Add a fixing at the far end
      </button>
    </fieldset>
  );
}

function Ground({ project }: { project: Project }) {
  const ground = project.ground ?? [];
  return (
    <fieldset>
      <legend>Ground line</legend>
      {ground.length === 0 && <p className="muted">Level ground at height 0.</p>}
      {ground.map((point, i) => (
        // biome-ignore lint/suspicious/noArrayIndexKey: rows are positions in the list
        <Row key={i} label={`Ground point ${i + 1}`}>
          <NumberField
            path={`ground[${i}].x`}
            context={`Ground point ${i + 1}`}
            label="Position"
            quantity="length"
            value={point.x}
            edit={(x) => edits.patchGround(i, { x })}
          />
          <NumberField
            path={`ground[${i}].z`}
            context={`Ground point ${i + 1}`}
            label="Height"
            quantity="length"
            value={point.z}
            edit={(z) => edits.patchGround(i, { z })}
          />
          <button
            type="button"
            onClick={() => applyEdit(edits.removeGroundPoint(i), `Remove ground point ${i + 1}`)}
          >
            Remove ground point {i + 1}
          </button>
        </Row>
      ))}
      <button type="button" onClick={() => applyEdit(edits.addGroundPoint(), 'Add a ground point')}>
        Add a ground point
      </button>
    </fieldset>
  );
}

function Zones({ project }: { project: Project }) {
  const zones = project.limits.zones ?? [];
  return (
    <fieldset>
      <legend>Clearance zones (paths, driveways)</legend>
      {zones.map((zone, i) => {
        const path = `limits.zones[${i}]`;
        const name = zone.label || `Zone ${i + 1}`;
        return (
          // biome-ignore lint/suspicious/noArrayIndexKey: rows are positions in the list
          <Row key={i} label={`Clearance zone ${i + 1}`}>
            <TextField
              path={`${path}.label`}
              context={`Zone ${i + 1}`}
              label="Name"
              value={zone.label ?? ''}
              edit={(label) => edits.patchZone(i, { label })}
            />
            <NumberField
              path={`${path}.from`}
              context={name}
              label="From"
              quantity="length"
              value={zone.from}
              edit={(from) => edits.patchZone(i, { from })}
            />
            <NumberField
              path={`${path}.to`}
              context={name}
              label="To"
              quantity="length"
              value={zone.to}
              edit={(to) => edits.patchZone(i, { to })}
            />
            <NumberField
              path={`${path}.height`}
              context={name}
              label="Clearance needed"
              quantity="length"
              value={zone.height}
              edit={(height) => edits.patchZone(i, { height })}
            />
            <button type="button" onClick={() => applyEdit(edits.removeZone(i), `Remove ${name}`)}>
              Remove {name}
            </button>
          </Row>
        );
      })}
      <button type="button" onClick={() => applyEdit(edits.addZone(), 'Add a clearance zone')}>
        Add a clearance zone
      </button>
    </fieldset>
  );
}

export function SpanPanel() {
  const project = useProjectStore((s) => s.project);
  return (
    <section className="panel" aria-labelledby="span-heading">
      <h2 id="span-heading">Span</h2>
      <Supports project={project} />
      <Ground project={project} />
      <Zones project={project} />
    </section>
  );
}
