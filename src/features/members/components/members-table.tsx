import { createColumnHelper, useTable } from "@tanstack/react-table";
import { useMemo, useState } from "react";
import { ROLE_LABELS, ROLES, type AuthUser, type Role } from "@shared/schemas/auth.ts";
import type { Member } from "@shared/schemas/members.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { SortableTable, sortableTableFeatures } from "@/components/ui/data-table/sortable-table.tsx";
import { useRemoveMember, useUpdateMemberRole } from "@/lib/api/members.ts";

const column = createColumnHelper<typeof sortableTableFeatures, Member>();

function RoleCell({ member, canManage }: { member: Member; canManage: boolean }) {
  const update = useUpdateMemberRole();
  if (!canManage) return <span>{ROLE_LABELS[member.role]}</span>;
  return (
    <select
      aria-label={`Role of ${member.name}`}
      value={member.role}
      disabled={update.isPending}
      onChange={(event) => update.mutate({ id: member.id, role: event.target.value as Role })}
      className="min-h-touch w-full min-w-40 rounded-card border-2 border-rule bg-surface px-2"
    >
      {ROLES.map((role) => (
        <option key={role} value={role}>
          {ROLE_LABELS[role]}
        </option>
      ))}
    </select>
  );
}

function RemoveCell({ member, isSelf }: { member: Member; isSelf: boolean }) {
  const remove = useRemoveMember();
  const [confirming, setConfirming] = useState(false);
  if (!confirming) {
    return (
      <Button variant="secondary" onClick={() => setConfirming(true)} aria-label={`Remove ${member.name}`}>
        Remove
      </Button>
    );
  }
  return (
    <div className="flex flex-wrap gap-2">
      <Button variant="danger" disabled={remove.isPending} onClick={() => remove.mutate(member.id)}>
        {isSelf ? "Yes, remove me" : `Yes, remove ${member.name.split(" ")[0]}`}
      </Button>
      <Button variant="quiet" onClick={() => setConfirming(false)}>
        Keep
      </Button>
    </div>
  );
}

const nameColumn = column.accessor("name", { header: "Name" });
const emailColumn = column.accessor("email", {
  header: "E-mail",
  cell: (info) => <span className="break-all">{info.getValue()}</span>,
});

/** The company's people. Owners change roles and remove people in place; others just read it. */
export function MembersTable({ members, viewer }: { members: Member[]; viewer: AuthUser }) {
  const canManage = viewer.role === "owner";
  // Columns stay the same object between renders (react-table v9 rebuilds its models when they change).
  const columns = useMemo(() => {
    const roleColumn = column.accessor("role", {
      header: "Role",
      cell: (info) => <RoleCell member={info.row.original} canManage={canManage} />,
    });
    const actionsColumn = column.display({
      id: "actions",
      header: "Actions",
      cell: (info) => <RemoveCell member={info.row.original} isSelf={info.row.original.id === viewer.id} />,
    });
    return canManage
      ? column.columns([nameColumn, emailColumn, roleColumn, actionsColumn])
      : column.columns([nameColumn, emailColumn, roleColumn]);
  }, [canManage, viewer.id]);
  // A company's handful of people reads in the server's order; no column sorts.
  const table = useTable({
    features: sortableTableFeatures,
    columns,
    data: members,
    getRowId: (row) => row.id,
    enableSorting: false,
  });

  // On a phone each member is a stacked card (label above value); from sm up it is a plain table.
  return <SortableTable table={table} caption="Members and their roles" phones="stacked" />;
}
