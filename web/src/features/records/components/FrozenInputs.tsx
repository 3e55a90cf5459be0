import type { RecordContent } from "../../../../../core/contract/records";
import { frozenInputs, type InputLine } from "../model/frozen-inputs";

function Section({ title, lines, empty }: { title: string; lines: InputLine[]; empty: string }) {
  return (
    <section aria-label={title} className="px-3 py-2">
      <h3 className="text-[14px] font-semibold text-graphite">{title}</h3>
      {lines.length === 0 ? (
        <p className="text-[13px] text-graphite-soft">{empty}</p>
      ) : (
        <ul className="divide-y divide-rule text-[14px]">
          {lines.map((l, i) => (
            <li key={`${l.label}-${i}`} className="py-1">
              <span className="font-semibold">{l.label}</span>: <span className="num">{l.value}</span>
              {l.detail && <span className="block text-[13px] text-graphite-soft">{l.detail}</span>}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

/** Every input the record froze, with units and sources, in the order a check is set up. */
export function FrozenInputs({ content }: { content: RecordContent }) {
  const inputs = frozenInputs(content);
  return (
    <div className="divide-y divide-rule">
      <Section title="Required factors" lines={inputs.requirements} empty="None." />
      <Section
        title="Materials of the workspace library"
        lines={inputs.materials}
        empty="None: built-in published values only."
      />
      <Section title="Locations and their materials" lines={inputs.locations} empty="None." />
      <Section
        title="States (as entered, with their unit and revision)"
        lines={inputs.states}
        empty="No state entered."
      />
      <Section title="Combinations" lines={inputs.combinations} empty="None." />
    </div>
  );
}
