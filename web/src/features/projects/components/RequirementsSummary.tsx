import type { MaterialList } from "../../../../../core/contract/materials";
import { CRITERION_LABELS, type Project } from "../../../../../core/contract/projects";
import { quietButton } from "../../../lib/forms";
import { materialName } from "../model/material-refs";
import { unitSystemLabel } from "../model/requirements";

/**
 * The checks as they stand (the read-only face of the checks panel): default factors, the factors
 * of each load-case category beside them, how unsuited criteria are treated, the default material
 * and the display units.
 */
export function RequirementsSummary({
  project,
  materials,
  canEdit,
  onChange,
}: {
  project: Project;
  materials: MaterialList | undefined;
  canEdit: boolean;
  /** Opens the form (editors and owners only). */
  onChange: () => void;
}) {
  return (
    <>
      <p className="text-[13px] text-graphite-soft">
        Project default (every load case whose category has no factors of its own):
      </p>
      <ul className="flex flex-wrap gap-x-6 gap-y-1" data-testid="default-requirements">
        {project.requirements.map((r) => (
          <li key={r.criterion}>
            {CRITERION_LABELS[r.criterion]}: n ≥ <span className="num">{r.requiredFactor}</span>
          </li>
        ))}
      </ul>
      {project.categoryRequirements.length > 0 && (
        <table className="text-[14px]" data-testid="category-requirements">
          <thead>
            <tr className="text-left text-[13px] text-graphite-soft">
              <th scope="col" className="pr-4 font-normal">
                load-case category
              </th>
              {project.requirements.map((r) => (
                <th key={r.criterion} scope="col" className="pr-4 text-right font-normal">
                  {CRITERION_LABELS[r.criterion]}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {project.categoryRequirements.map((c) => (
              <tr key={c.category}>
                <th scope="row" className="pr-4 text-left font-normal">
                  {c.category}
                </th>
                {project.requirements.map((r) => (
                  <td key={r.criterion} className="pr-4 text-right">
                    {c.factors[r.criterion] === undefined ? (
                      <span className="text-graphite-soft">default</span>
                    ) : (
                      <>
                        n ≥ <span className="num">{c.factors[r.criterion]}</span>
                      </>
                    )}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <p className="text-[13px] text-graphite-soft">
        {project.includeUnsuitedCriteria
          ? "Criteria that do not suit a location's material (ductile vs brittle) are rated on request and can govern."
          : "Criteria that do not suit a location's material (fracture criteria on a ductile metal, yield criteria on a brittle one) are shown as not applicable and left out of the governing search."}
      </p>
      <p>
        Default material: <strong>{materialName(project.defaultMaterial, materials) ?? "none chosen"}</strong>
        {project.defaultMaterial?.kind === "published" && (
          <span className="text-graphite-soft">
            {" "}
            — published minimum values; verify against your certificate.
          </span>
        )}
      </p>
      <p className="text-graphite-soft">Values shown in {unitSystemLabel(project.unitSystem)}.</p>
      {canEdit && (
        <button type="button" className={quietButton} onClick={onChange}>
          Change checks
        </button>
      )}
    </>
  );
}
