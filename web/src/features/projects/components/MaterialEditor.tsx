import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import {
  materialSchema,
  STRESS_UNIT_NAMES,
  updateMaterialBodySchema,
  type Material,
  type UpdateMaterialBody,
} from "../../../../../core/contract/materials";
import { ApiError } from "../../../lib/api-client";
import { applyServerErrors, Field, FormMessage, primaryButton, quietButton } from "../../../lib/forms";
import { useUpdateMaterial } from "../../../entities/material/mutations";
import { editableStress } from "../../../lib/stress";

/** Fields the form edits, and the ones a 400 may name. */
const FIELDS = [
  "name",
  "unit",
  "yield",
  "ultimateTension",
  "ultimateCompression",
  "elasticModulus",
  "poissonRatio",
  "reference",
  "note",
] as const;

/** A stored material as the form shows it: strengths and E back in the unit they were entered in. */
function valuesOf(m: Material): UpdateMaterialBody {
  const inUnit = (pa: number | null) => (pa === null ? null : editableStress(pa, m.unit));
  return {
    version: m.version,
    name: m.name,
    unit: m.unit,
    yield: inUnit(m.yieldPa),
    ultimateTension: inUnit(m.ultimateTensionPa),
    ultimateCompression: inUnit(m.ultimateCompressionPa),
    elasticModulus: inUnit(m.elasticModulusPa),
    poissonRatio: m.poissonRatio,
    reference: m.reference,
    note: m.note,
  };
}

/** An empty box means "not given" (null); anything else is read as a number for the schema to judge. */
const asNumber = (v: unknown) => (v === "" || v === null || v === undefined ? null : Number(v));

/**
 * Edits a library material with the shared update schema (errors beside each field, from the
 * browser's check or the server's 400), over the version it was opened at; a stale save is
 * refused with 409 and the form offers to reload the stored values or to save over them.
 */
export function MaterialEditor({
  workspaceId,
  material,
  onDone,
}: {
  workspaceId: string;
  material: Material;
  onDone: () => void;
}) {
  const update = useUpdateMaterial(workspaceId);
  const form = useForm<UpdateMaterialBody>({
    resolver: zodResolver(updateMaterialBodySchema),
    defaultValues: valuesOf(material),
  });
  const [conflict, setConflict] = useState<{ currentVersion: number; current: Material } | null>(null);
  const errors = form.formState.errors;
  const version = useWatch({ control: form.control, name: "version" });
  const id = (field: string) => `material-${material.id}-${field}`;

  const save = (body: UpdateMaterialBody) =>
    update.mutate(
      { id: material.id, ...body },
      {
        onSuccess: onDone,
        onError: (error) => {
          if (error instanceof ApiError && error.status === 409) {
            const details = error.details as { currentVersion?: number; current?: unknown } | undefined;
            const current = materialSchema.safeParse(details?.current);
            if (typeof details?.currentVersion === "number" && current.success)
              setConflict({ currentVersion: details.currentVersion, current: current.data });
            return;
          }
          applyServerErrors(error, form.setError, [...FIELDS]);
        },
      },
    );
  const onSubmit = form.handleSubmit(save);
  const strength = (
    field: "yield" | "ultimateTension" | "ultimateCompression" | "elasticModulus",
    label: string,
  ) => (
    <Field
      id={id(field)}
      label={label}
      inputMode="decimal"
      error={errors[field]?.message}
      {...form.register(field, { setValueAs: asNumber })}
    />
  );

  return (
    <form
      aria-label={`Edit material ${material.name}`}
      onSubmit={onSubmit}
      noValidate
      className="space-y-3 bg-paper p-3 text-[14px]"
    >
      <div className="grid grid-cols-2 gap-3 md:grid-cols-4">
        <Field id={id("name")} label="Name" error={errors.name?.message} {...form.register("name")} />
        <div className="space-y-1">
          <label htmlFor={id("unit")} className="block text-sm font-semibold text-graphite">
            Unit of strengths and E
          </label>
          <select
            id={id("unit")}
            className="w-full rounded border border-rule-strong bg-panel px-2 py-2"
            {...form.register("unit")}
          >
            {STRESS_UNIT_NAMES.map((u) => (
              <option key={u}>{u}</option>
            ))}
          </select>
        </div>
        {strength("yield", "Yield strength")}
        {strength("ultimateTension", "Ultimate tensile strength")}
        {strength("ultimateCompression", "Ultimate compressive strength")}
        {strength("elasticModulus", "Elastic modulus E")}
        <Field
          id={id("poissonRatio")}
          label="Poisson's ratio ν"
          inputMode="decimal"
          error={errors.poissonRatio?.message}
          {...form.register("poissonRatio", { setValueAs: asNumber })}
        />
        <Field
          id={id("reference")}
          label="Reference (standard, certificate)"
          error={errors.reference?.message}
          {...form.register("reference")}
        />
      </div>
      <Field id={id("note")} label="Note" error={errors.note?.message} {...form.register("note")} />
      <div className="flex flex-wrap items-center gap-2">
        <button type="submit" className={primaryButton} disabled={update.isPending || !!conflict}>
          Save material
        </button>
        <button type="button" className={quietButton} onClick={onDone}>
          Cancel
        </button>
        <span className="text-[12px] text-graphite-faint">
          editing version <span className="num">{version}</span>
        </span>
      </div>
      {conflict && (
        <div
          role="alert"
          className="space-y-1 rounded-sm border border-fail bg-fail-wash px-2 py-1.5 text-fail"
        >
          <p>
            ✗ Someone changed this material while you were editing (it is now version{" "}
            {conflict.currentVersion}
            ). Nothing was overwritten.
          </p>
          <div className="flex gap-2">
            <button
              type="button"
              className={quietButton}
              onClick={() => {
                form.reset(valuesOf(conflict.current));
                setConflict(null);
              }}
            >
              Reload their values
            </button>
            <button
              type="button"
              className={quietButton}
              onClick={() => {
                form.setValue("version", conflict.currentVersion);
                setConflict(null);
                void onSubmit();
              }}
            >
              Keep my values and save over version {conflict.currentVersion}
            </button>
          </div>
        </div>
      )}
      {update.error &&
        !conflict &&
        !(update.error instanceof ApiError && update.error.id === "invalid_input") && (
          <FormMessage error={update.error} />
        )}
    </form>
  );
}
