import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
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
import { apiRequest } from "./api-client.ts";

const EquipmentListSchema = z.object({ equipment: z.array(EquipmentSchema) });
const EquipmentCreatedSchema = z.object({ equipment: EquipmentSchema });
const SitesSchema = z.object({ sites: z.array(SiteSchema) });
const CustomersSchema = z.object({ customers: z.array(CustomerSchema) });

export async function getEquipmentList(signal?: AbortSignal): Promise<Equipment[]> {
  return (await apiRequest("/equipment", { schema: EquipmentListSchema, signal })).equipment;
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

export const equipmentListQueryOptions = () =>
  queryOptions({ queryKey: ["equipment", "list"], queryFn: ({ signal }) => getEquipmentList(signal) });

export const equipmentDetailQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ["equipment", "detail", id],
    queryFn: ({ signal }) => getEquipmentDetail(id, signal),
    // Pages that learn the id from another answer (a visit) pass "" meanwhile: "/equipment/" is the whole list.
    enabled: id !== "",
  });

export const sitesQueryOptions = () => queryOptions({ queryKey: ["sites", "list"], queryFn: ({ signal }) => getSites(signal) });

export const useEquipmentList = () => useQuery(equipmentListQueryOptions());
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
  return (await apiRequest("/customers", { method: "POST", body: values, schema: z.object({ customer: CustomerSchema }) })).customer;
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
