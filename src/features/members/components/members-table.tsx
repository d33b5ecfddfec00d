import { createColumnHelper, tableFeatures, useTable } from "@tanstack/react-table";
import { useMemo, useState } from "react";
import { ROLE_LABELS, ROLES, type AuthUser, type Role } from "@shared/schemas/auth.ts";
import type { Member } from "@shared/schemas/members.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { useRemoveMember, useUpdateMemberRole } from "@/lib/api/members.ts";

const features = tableFeatures({});
const column = createColumnHelper<typeof features, Member>();

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
  const table = useTable({ features, columns, data: members, getRowId: (row) => row.id });

  // On a phone each member is a stacked card (label above value); from sm up it is a plain table.
  return (
    <div className="rounded-card border-2 border-rule bg-surface">
      <table className="w-full text-left">
        <caption className="sr-only">Members and their roles</caption>
        <thead className="sr-only border-b-2 border-rule sm:not-sr-only sm:table-header-group">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => (
                <th key={header.id} scope="col" className="px-3 py-2 font-semibold">
                  {header.isPlaceholder ? null : <table.FlexRender header={header} />}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="block border-b border-rule py-2 last:border-b-0 sm:table-row sm:py-0">
              {row.getAllCells().map((cell) => (
                <td key={cell.id} className="block px-3 py-1 align-middle sm:table-cell sm:py-2">
                  <span aria-hidden className="block text-sm text-muted sm:hidden">
                    {String(cell.column.columnDef.header ?? "")}
                  </span>
                  <table.FlexRender cell={cell} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
