import { useState, type FormEvent } from "react";
import { LOAD_CASE_CATEGORY_SUGGESTIONS } from "../../../../../core/contract/load-cases";
import { useCreateLoadCase } from "../../../entities/load-case/mutations";
import { fieldErrorsOf } from "../../../lib/api-client";
import { FormMessage, primaryButton } from "../../../lib/forms";

/**
 * Adds a load case by name and category. The category list offers the usual ones and those the
 * project gives factors of their own (the `case-categories` list the rename form uses too).
 */
export function NewLoadCaseForm({
  workspaceId,
  projectId,
  allowableCategories,
}: {
  workspaceId: string;
  projectId: string;
  allowableCategories: string[];
}) {
  const create = useCreateLoadCase(workspaceId, projectId);
  const [name, setName] = useState("");
  const [category, setCategory] = useState("");
  const add = (e: FormEvent) => {
    e.preventDefault();
    create.mutate({ name, category }, { onSuccess: () => (setName(""), setCategory("")) });
  };
  return (
    <form onSubmit={add} noValidate className="flex flex-wrap items-start gap-2 border-t border-rule p-3">
      <label className="sr-only" htmlFor="new-case">
        New load case name
      </label>
      <input
        id="new-case"
        placeholder="e.g. Hydrostatic test"
        value={name}
        onChange={(e) => setName(e.target.value)}
        className="min-w-52 flex-1 rounded-sm border border-rule-strong bg-panel px-2 py-1"
      />
      <label className="sr-only" htmlFor="new-case-category">
        Category
      </label>
      <input
        id="new-case-category"
        list="case-categories"
        placeholder="category"
        value={category}
        onChange={(e) => setCategory(e.target.value)}
        className="w-36 rounded-sm border border-rule-strong bg-panel px-2 py-1"
      />
      <datalist id="case-categories">
        {[...new Set([...LOAD_CASE_CATEGORY_SUGGESTIONS, ...allowableCategories.map((a) => a.trim())])].map(
          (s) => (
            <option key={s} value={s} />
          ),
        )}
      </datalist>
      <button type="submit" className={primaryButton} disabled={create.isPending}>
        Add load case
      </button>
      <div className="basis-full">
        <FormMessage>{fieldErrorsOf(create.error).name}</FormMessage>
      </div>
    </form>
  );
}
