/**
 * Who may read which line of the refrigerant register: the one rule, applied by every route
 * that answers with register lines (a visit's refrigerant, a unit's history, a cylinder's
 * movements, the register and its CSV export).
 *
 * - Owners and seniors read every line of their company (PERMISSIONS.readAllRegisterLines).
 * - Technicians read the lines they recorded themselves (PERMISSIONS.readOwnRegisterLines).
 * - Apprentices read none.
 *
 * Figures worked out from the register — a circuit's balance, a unit's top-ups and leak rate, a
 * cylinder's contents — still count every line: they describe the equipment and the cylinder,
 * which everyone in the company may see, and name nobody. The answer says how many lines it
 * leaves out, so a screen can say that the balance counts entries it does not list.
 */
import { can, type Role } from "@shared/schemas/auth.ts";

export interface RegisterReader {
  id: string;
  role: Role;
}

/** May this person read a line recorded by `technicianId` (null when its recorder's account is gone)? */
export function mayReadRegisterLine(reader: RegisterReader, technicianId: string | null): boolean {
  if (can(reader.role, "readAllRegisterLines")) return true;
  return can(reader.role, "readOwnRegisterLines") && technicianId === reader.id;
}

/** May this person read every line, whoever recorded it? */
export const readsWholeRegister = (reader: RegisterReader): boolean => can(reader.role, "readAllRegisterLines");

/** The lines this person may read, and how many were left out. */
export function visibleRegisterLines<Line extends { technician: { id: string } | null }>(
  reader: RegisterReader,
  lines: readonly Line[],
): { movements: Line[]; hiddenMovements: number } {
  const movements = lines.filter((line) => mayReadRegisterLine(reader, line.technician?.id ?? null));
  return { movements, hiddenMovements: lines.length - movements.length };
}
