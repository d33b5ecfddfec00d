import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import {
  CylinderDetailSchema,
  CylinderSchema,
  EquipmentRefrigerantSchema,
  MovementCreatedSchema,
  RegisterListSchema,
  VisitRefrigerantSchema,
  type ChargingUpdate,
  type Cylinder,
  type CylinderCreate,
  type CylinderDetail,
  type EquipmentRefrigerant,
  type MovementCreate,
  type ReclaimCreate,
  type RegisterList,
  type RegisterQuery,
  type VisitRefrigerant,
} from "@shared/schemas/register.ts";
import type { RegisterPageParams } from "@shared/schemas/list-pages.ts";
import { apiRequest } from "./api-client.ts";
import { listQueryString } from "./list-params.ts";

const CylinderListSchema = z.object({ cylinders: z.array(CylinderSchema) });
const CylinderEnvelopeSchema = z.object({ cylinder: CylinderSchema });

export async function getCylinders(filter: { refrigerant?: string }, signal?: AbortSignal): Promise<Cylinder[]> {
  const query = filter.refrigerant ? `?refrigerant=${encodeURIComponent(filter.refrigerant)}` : "";
  return (await apiRequest(`/cylinders${query}`, { schema: CylinderListSchema, signal })).cylinders;
}

export function getCylinder(id: string, signal?: AbortSignal): Promise<CylinderDetail> {
  return apiRequest(`/cylinders/${id}`, { schema: CylinderDetailSchema, signal });
}

export async function createCylinder(values: CylinderCreate): Promise<Cylinder> {
  return (await apiRequest("/cylinders", { method: "POST", body: values, schema: CylinderEnvelopeSchema })).cylinder;
}

export function sendCylinderForReclaim({ cylinderId, ...body }: ReclaimCreate & { cylinderId: string }) {
  return apiRequest(`/cylinders/${cylinderId}/reclaim`, { method: "POST", body, schema: MovementCreatedSchema });
}

export function getVisitRefrigerant(visitId: string, signal?: AbortSignal): Promise<VisitRefrigerant> {
  return apiRequest(`/visits/${visitId}/refrigerant`, { schema: VisitRefrigerantSchema, signal });
}

/** Where a visit's register movements are logged. */
export const movementsPath = (visitId: string) => `/visits/${visitId}/refrigerant`;

export function createMovement({ visitId, ...body }: MovementCreate & { visitId: string }) {
  return apiRequest(movementsPath(visitId), { method: "POST", body, schema: MovementCreatedSchema });
}

/** Declares a full weigh-in of a circuit with its line adjustment (withdrawing one is a void). */
export function setCharging({
  visitId,
  circuit,
  value,
}: {
  visitId: string;
  circuit: number;
  value: ChargingUpdate;
}): Promise<VisitRefrigerant> {
  return apiRequest(`/visits/${visitId}/refrigerant/charging/${circuit}`, {
    method: "PUT",
    body: value,
    schema: VisitRefrigerantSchema,
  });
}

export function getEquipmentRefrigerant(equipmentId: string, signal?: AbortSignal): Promise<EquipmentRefrigerant> {
  return apiRequest(`/equipment/${equipmentId}/refrigerant`, { schema: EquipmentRefrigerantSchema, signal });
}

/** One page of the register and the totals of its whole period (see RegisterPageQuerySchema). */
export function getRegister(params: RegisterPageParams, signal?: AbortSignal): Promise<RegisterList> {
  return apiRequest(`/register${listQueryString(params)}`, { schema: RegisterListSchema, signal });
}

/**
 * The CSV of the whole period (not a page), downloaded by the browser itself (a plain link), so
 * it keeps the session cookie.
 */
export const registerExportHref = (filter: RegisterQuery) => `/api/register/export.csv${listQueryString(filter)}`;

export const cylindersQueryOptions = (filter: { refrigerant?: string } = {}) =>
  queryOptions({ queryKey: ["cylinders", "list", filter], queryFn: ({ signal }) => getCylinders(filter, signal) });

export const cylinderQueryOptions = (id: string) =>
  queryOptions({ queryKey: ["cylinders", "detail", id], queryFn: ({ signal }) => getCylinder(id, signal) });

export const visitRefrigerantQueryOptions = (visitId: string) =>
  queryOptions({
    queryKey: ["register", "visit", visitId],
    queryFn: ({ signal }) => getVisitRefrigerant(visitId, signal),
  });

export const equipmentRefrigerantQueryOptions = (equipmentId: string) =>
  queryOptions({
    queryKey: ["register", "equipment", equipmentId],
    queryFn: ({ signal }) => getEquipmentRefrigerant(equipmentId, signal),
  });

/** The key holds every parameter, cursor included: each page of each period is its own entry. */
export const registerQueryOptions = (params: RegisterPageParams) =>
  queryOptions({ queryKey: ["register", "list", params], queryFn: ({ signal }) => getRegister(params, signal) });

export const useCylinders = (filter: { refrigerant?: string } = {}) => useQuery(cylindersQueryOptions(filter));
export const useCylinder = (id: string) => useQuery(cylinderQueryOptions(id));
export const useVisitRefrigerant = (visitId: string) => useQuery(visitRefrigerantQueryOptions(visitId));
export const useEquipmentRefrigerant = (equipmentId: string) => useQuery(equipmentRefrigerantQueryOptions(equipmentId));
/** A page of the register; while the next page (or another period) loads, the last one stays on screen. */
export const useRegister = (params: RegisterPageParams) =>
  useQuery({ ...registerQueryOptions(params), placeholderData: keepPreviousData });

/**
 * Every register change moves cylinder contents and balances: refresh both families. A weigh-in
 * declaration also changes the circuit's correct charge and may calibrate it: its reference points too.
 */
function useRegisterMutation<TVariables, TResult>(
  mutationFn: (variables: TVariables) => Promise<TResult>,
  options: { silentErrors?: boolean; alsoRefresh?: readonly string[][] } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn,
    meta: options.silentErrors ? { silentErrors: true } : undefined,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ["register"] }),
        queryClient.invalidateQueries({ queryKey: ["cylinders"] }),
        ...(options.alsoRefresh ?? []).map((queryKey) => queryClient.invalidateQueries({ queryKey })),
      ]),
  });
}

export const useCreateCylinder = () => useRegisterMutation(createCylinder);
// A visit movement writes its run-log charge adjustment too: the visit's adjustments change with it.
export const useCreateMovement = () => useRegisterMutation(createMovement, { alsoRefresh: [["visits", "detail"]] });
export const useSendCylinderForReclaim = () => useRegisterMutation(sendCylinderForReclaim);
export const useSetCharging = () => useRegisterMutation(setCharging, { alsoRefresh: [["charge-references"]] });
