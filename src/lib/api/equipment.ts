import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { EquipmentDetailSchema, type EquipmentDetail } from "@shared/schemas/equipment-detail.ts";
import {
  CustomerSchema,
  EquipmentSchema,
  SiteSchema,
  type Customer,
  type CustomerInput,
  type Equipment,
  type EquipmentInput,
  type Site,
  type SiteInput,
} from "@shared/schemas/equipment.ts";
import { RefrigerantsInUseSchema } from "@shared/schemas/refrigerants-in-use.ts";
import { EquipmentPageSchema, type EquipmentListParams, type EquipmentPage } from "@shared/schemas/list-pages.ts";
import { apiRequest } from "./api-client.ts";
import { listQueryString } from "./list-params.ts";

const EquipmentCreatedSchema = z.object({ equipment: EquipmentSchema });
const SitesSchema = z.object({ sites: z.array(SiteSchema) });
const CustomersSchema = z.object({ customers: z.array(CustomerSchema) });

/** One page of the company's units, searched and sorted by the server (see shared/schemas/list-pages.ts). */
export function getEquipmentList(params: EquipmentListParams = {}, signal?: AbortSignal): Promise<EquipmentPage> {
  return apiRequest(`/equipment${listQueryString(params)}`, { schema: EquipmentPageSchema, signal });
}

export function getEquipmentDetail(id: string, signal?: AbortSignal): Promise<EquipmentDetail> {
  return apiRequest(`/equipment/${id}`, { schema: EquipmentDetailSchema, signal });
}

export async function createEquipment(values: EquipmentInput): Promise<Equipment> {
  return (await apiRequest("/equipment", { method: "POST", body: values, schema: EquipmentCreatedSchema })).equipment;
}

export async function getSites(signal?: AbortSignal): Promise<Site[]> {
  return (await apiRequest("/sites", { schema: SitesSchema, signal })).sites;
}

export async function getCustomers(signal?: AbortSignal) {
  return (await apiRequest("/customers", { schema: CustomersSchema, signal })).customers;
}

/** The key holds every parameter, cursor included: each page of each search is its own entry. */
export const equipmentListQueryOptions = (params: EquipmentListParams = {}) =>
  queryOptions({ queryKey: ["equipment", "list", params], queryFn: ({ signal }) => getEquipmentList(params, signal) });

export const equipmentDetailQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ["equipment", "detail", id],
    queryFn: ({ signal }) => getEquipmentDetail(id, signal),
  });

export const sitesQueryOptions = () =>
  queryOptions({ queryKey: ["sites", "list"], queryFn: ({ signal }) => getSites(signal) });

/** A page of units; while the next page (or another search) loads, the last one stays on screen. */
export const useEquipmentList = (params: EquipmentListParams = {}, { enabled = true } = {}) =>
  useQuery({ ...equipmentListQueryOptions(params), placeholderData: keepPreviousData, enabled });
export const useEquipmentDetail = (id: string) => useQuery(equipmentDetailQueryOptions(id));
export const useSites = () => useQuery(sitesQueryOptions());

export function useCreateEquipment() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createEquipment,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["equipment"] }),
  });
}

export async function createCustomer(values: CustomerInput): Promise<Customer> {
  return (
    await apiRequest("/customers", { method: "POST", body: values, schema: z.object({ customer: CustomerSchema }) })
  ).customer;
}

export async function createSite(values: SiteInput): Promise<Site> {
  return (await apiRequest("/sites", { method: "POST", body: values, schema: z.object({ site: SiteSchema }) })).site;
}

export const customersQueryOptions = () =>
  queryOptions({ queryKey: ["customers", "list"], queryFn: ({ signal }) => getCustomers(signal) });

export const useCustomers = () => useQuery(customersQueryOptions());

export function useCreateCustomer() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCustomer,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["customers"] }),
  });
}

export function useCreateSite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSite,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["sites"] }),
  });
}

/** The refrigerants of the company's units in use: the property tables a device keeps for offline use. */
export async function getRefrigerantsInUse(signal?: AbortSignal): Promise<string[]> {
  return (await apiRequest("/equipment/refrigerants", { schema: RefrigerantsInUseSchema, signal })).refrigerants;
}
