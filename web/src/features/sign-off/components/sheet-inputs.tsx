import { describeInputs, KINDS, type UnitSystem } from '@loftwright/buoyancy';
import { useReadingPreferences } from '@/components/reading/reading-preferences';

/** The inputs of the version, section by section, each by its label in the reader's units. */
export function SheetInputs({
  kind,
  inputs,
  unitSystem,
}: {
  kind: string;
  inputs: Record<string, unknown>;
  unitSystem: UnitSystem;
}) {
  const { numberFormat } = useReadingPreferences();
  const schema = KINDS.find((candidate) => candidate.id === kind)?.inputSchema;
  const sections = describeInputs(schema, inputs, { unitSystem, numberFormat });
  return (
    <>
      <h2>Inputs</h2>
      {sections.map((section, index) => (
        <section key={section.title ?? `loose-${index}`} className="lw-sheet-section">
          {section.title ? <h3>{section.title}</h3> : null}
          <table>
            <tbody>
              {section.lines.map((line) => (
                <tr key={line.path}>
                  <th scope="row">{line.label}</th>
                  <td>{line.text}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      ))}
    </>
  );
}
