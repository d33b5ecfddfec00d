import { zodResolver } from "@hookform/resolvers/zod";
import { useState, type KeyboardEvent } from "react";
import { useForm } from "react-hook-form";
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

function NewCustomerForm({ onCreated, onCancel }: { onCreated: (customer: Customer) => void; onCancel?: () => void }) {
  const create = useCreateCustomer();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm({
    resolver: zodResolver(CustomerInputSchema),
    defaultValues: { name: "", contactName: "", contactEmail: "", contactPhone: "" },
  });
  const { errors } = form.formState;
  const submit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      onCreated(await create.mutateAsync(values));
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ["name", "contactName", "contactEmail", "contactPhone"]));
    }
  });
  return (
    <fieldset
      className="space-y-3 rounded-card border-2 border-dashed border-rule p-3"
      onKeyDown={submitOnEnter(() => void submit())}
    >
      <legend className="px-1 font-semibold">New customer</legend>
      {formError && <FormAlert>{formError}</FormAlert>}
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
      <div className="flex flex-wrap gap-2">
        <Button onClick={() => void submit()} disabled={form.formState.isSubmitting}>
          {form.formState.isSubmitting ? "Saving customer…" : "Save customer"}
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

/** Adds a site (and, if needed, its customer) without leaving the equipment form. */
export function NewSitePanel({ onCreated, onCancel }: { onCreated: (site: Site) => void; onCancel?: () => void }) {
  const customers = useCustomers();
  const create = useCreateSite();
  const [formError, setFormError] = useState<string | null>(null);
  const [addingCustomer, setAddingCustomer] = useState(false);
  const form = useForm({
    resolver: zodResolver(SiteInputSchema),
    defaultValues: { customerId: "", name: "", address: "", altitudeM: undefined },
  });
  const { errors } = form.formState;
  const noCustomers = customers.isSuccess && customers.data.length === 0;
  const showCustomerForm = addingCustomer || noCustomers;

  const submit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      onCreated(await create.mutateAsync(values));
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ["customerId", "name", "address", "altitudeM"]));
    }
  });

  return (
    <fieldset
      className="space-y-3 rounded-card border-2 border-rule bg-paper p-4"
      onKeyDown={submitOnEnter(() => void submit())}
    >
      <legend className="px-1 text-lg font-semibold">New site</legend>
      {formError && <FormAlert>{formError}</FormAlert>}
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
      <div className="flex flex-wrap gap-2">
        <Button onClick={() => void submit()} disabled={form.formState.isSubmitting}>
          {form.formState.isSubmitting ? "Saving site…" : "Save site"}
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
