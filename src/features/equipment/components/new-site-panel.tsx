import { zodResolver } from "@hookform/resolvers/zod";
import { useState, type KeyboardEvent, type ReactNode } from "react";
import { useForm, type FieldValues, type Path, type UseFormReturn } from "react-hook-form";
import { CustomerInputSchema, SiteInputSchema, type Customer, type Site } from "@shared/schemas/equipment.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, SelectField, TextField } from "@/components/ui/field/field.tsx";
import { useCreateCustomer, useCreateSite, useCustomers } from "@/lib/api/equipment.ts";
import { applyServerErrors } from "@/lib/form-errors.ts";
import { NumberField, typedNumber } from "@/components/ui/field/number-field.tsx";

/**
 * These panels sit inside the equipment form, and forms cannot nest: Enter in one of their
 * fields saves the panel instead of submitting the whole unit.
 */
function submitOnEnter(submit: () => void) {
  return (event: KeyboardEvent) => {
    if (event.key === "Enter" && event.target instanceof HTMLInputElement) {
      event.preventDefault();
      // A customer panel sits inside the site panel: only the innermost one saves.
      event.stopPropagation();
      submit();
    }
  };
}

/** The site's panel is framed as a panel; the customer's, inside it, dashed and smaller. */
const FRAMES = {
  panel: { fieldset: "space-y-3 rounded-card border-2 border-rule bg-paper p-4", legend: "px-1 text-lg font-semibold" },
  inner: { fieldset: "space-y-3 rounded-card border-2 border-dashed border-rule p-3", legend: "px-1 font-semibold" },
} as const;

interface NestedCreateFormProps<Input extends FieldValues, Values, Created> {
  /** What is made, e.g. "site": the heading says "New site", the button "Save site". */
  thing: string;
  frame: keyof typeof FRAMES;
  form: UseFormReturn<Input, unknown, Values>;
  /** Every field a server message can land on. */
  fields: readonly Path<Input>[];
  create: (values: Values) => Promise<Created>;
  onCreated: (created: Created) => void;
  onCancel?: () => void;
  children: ReactNode;
}

/**
 * A record made without leaving the equipment form (a site, its customer), saved the same way
 * each time: checked by the shared schema, sent, and on refusal the server's messages put under
 * their fields with what is left above them; Save and Cancel last.
 */
function NestedCreateForm<Input extends FieldValues, Values, Created>({
  thing,
  frame,
  form,
  fields,
  create,
  onCreated,
  onCancel,
  children,
}: NestedCreateFormProps<Input, Values, Created>) {
  const [formError, setFormError] = useState<string | null>(null);
  const submit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      onCreated(await create(values));
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, fields));
    }
  });
  return (
    <fieldset className={FRAMES[frame].fieldset} onKeyDown={submitOnEnter(() => void submit())}>
      <legend className={FRAMES[frame].legend}>New {thing}</legend>
      {formError && <FormAlert>{formError}</FormAlert>}
      {children}
      <div className="flex flex-wrap gap-2">
        <Button onClick={() => void submit()} disabled={form.formState.isSubmitting}>
          {form.formState.isSubmitting ? `Saving ${thing}…` : `Save ${thing}`}
        </Button>
        {onCancel && (
          <Button variant="quiet" onClick={onCancel}>
            Cancel
          </Button>
        )}
      </div>
    </fieldset>
  );
}

function NewCustomerForm({ onCreated, onCancel }: { onCreated: (customer: Customer) => void; onCancel?: () => void }) {
  const create = useCreateCustomer();
  const form = useForm({
    resolver: zodResolver(CustomerInputSchema),
    defaultValues: { name: "", contactName: "", contactEmail: "", contactPhone: "" },
  });
  const { errors } = form.formState;
  return (
    <NestedCreateForm
      thing="customer"
      frame="inner"
      form={form}
      fields={["name", "contactName", "contactEmail", "contactPhone"]}
      create={create.mutateAsync}
      onCreated={onCreated}
      onCancel={onCancel}
    >
      <TextField label="Customer name" error={errors.name?.message} {...form.register("name")} />
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField
          label="Contact person (optional)"
          autoComplete="off"
          error={errors.contactName?.message}
          {...form.register("contactName")}
        />
        <TextField
          label="Contact e-mail (optional)"
          type="email"
          inputMode="email"
          hint="Visit reports can be sent here."
          error={errors.contactEmail?.message}
          {...form.register("contactEmail")}
        />
        <TextField
          label="Contact phone (optional)"
          type="tel"
          error={errors.contactPhone?.message}
          {...form.register("contactPhone")}
        />
      </div>
    </NestedCreateForm>
  );
}

/** Adds a site (and, if needed, its customer) without leaving the equipment form. */
export function NewSitePanel({ onCreated, onCancel }: { onCreated: (site: Site) => void; onCancel?: () => void }) {
  const customers = useCustomers();
  const create = useCreateSite();
  const [addingCustomer, setAddingCustomer] = useState(false);
  const form = useForm({
    resolver: zodResolver(SiteInputSchema),
    defaultValues: { customerId: "", name: "", address: "", altitudeM: undefined },
  });
  const { errors } = form.formState;
  const noCustomers = customers.isSuccess && customers.data.length === 0;
  const showCustomerForm = addingCustomer || noCustomers;

  return (
    <NestedCreateForm
      thing="site"
      frame="panel"
      form={form}
      fields={["customerId", "name", "address", "altitudeM"]}
      create={create.mutateAsync}
      onCreated={onCreated}
      onCancel={onCancel}
    >
      {customers.isPending && <p>Loading customers…</p>}
      {customers.isError && <FormAlert>{customers.error.message}</FormAlert>}
      {customers.isSuccess && !noCustomers && (
        <div className="flex flex-wrap items-end gap-2">
          <div className="min-w-56 flex-1">
            <SelectField label="Customer" error={errors.customerId?.message} {...form.register("customerId")}>
              <option value="">Choose the customer…</option>
              {customers.data.map((customer) => (
                <option key={customer.id} value={customer.id}>
                  {customer.name}
                </option>
              ))}
            </SelectField>
          </div>
          {!addingCustomer && (
            <Button variant="secondary" onClick={() => setAddingCustomer(true)}>
              New customer
            </Button>
          )}
        </div>
      )}
      {noCustomers && (
        <p className="text-sm text-muted">
          Every site belongs to a customer. Start with the customer who owns the building.
        </p>
      )}
      {showCustomerForm && (
        <NewCustomerForm
          onCancel={noCustomers ? undefined : () => setAddingCustomer(false)}
          onCreated={(customer) => {
            setAddingCustomer(false);
            form.setValue("customerId", customer.id, { shouldValidate: true });
          }}
        />
      )}
      {noCustomers && errors.customerId && (
        <p className="text-sm font-medium text-fault">⚠ {errors.customerId.message}</p>
      )}
      <TextField
        label="Site name"
        hint="The building or place, e.g. “Wattle Lane Clinic — main building”."
        error={errors.name?.message}
        {...form.register("name")}
      />
      <TextField
        label="Address (optional)"
        autoComplete="street-address"
        error={errors.address?.message}
        {...form.register("address")}
      />
      <NumberField
        label="Altitude (optional)"
        unit="m"
        hint="Sets the site's atmospheric pressure for gauge-to-absolute conversion."
        error={errors.altitudeM?.message}
        registration={form.register("altitudeM", { setValueAs: typedNumber })}
      />
    </NestedCreateForm>
  );
}
