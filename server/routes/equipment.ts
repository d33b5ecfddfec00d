import { Router } from "express";
import { CustomerInputSchema, EquipmentInputSchema, SiteInputSchema } from "@shared/schemas/equipment.ts";
import type { EquipmentDetail } from "@shared/schemas/equipment-detail.ts";
import type { RefrigerantsInUse } from "@shared/schemas/refrigerants-in-use.ts";
import { EquipmentListQuerySchema } from "@shared/schemas/list-pages.ts";
import { getAuth } from "../auth/session.ts";
import {
  createCustomer,
  createEquipment,
  createSite,
  getEquipment,
  listCustomers,
  listEquipmentPage,
  listSites,
  type EquipmentRow,
} from "../db/equipment.ts";
import { refrigerantsInUse } from "../db/refrigerants-in-use.ts";
import { listVisits } from "../db/visits.ts";
import { lastSettledStates } from "../equipment/last-settled-states.ts";
import { HttpError, notFound } from "../http/http-error.ts";
import { parseId } from "../http/parse-id.ts";
import type { AccountRouteDeps } from "./route-deps.ts";

type Deps = Pick<AccountRouteDeps, "db">;

const toEquipment = (row: NonNullable<EquipmentRow>) => ({ ...row, createdAt: row.createdAt.toISOString() });

export function customersRouter({ db }: Deps): Router {
  const router = Router();
  router.get("/", async (_req, res) => {
    res.json({ customers: await listCustomers(db, getAuth(res).organisationId) });
  });
  router.post("/", async (req, res) => {
    const values = CustomerInputSchema.parse(req.body);
    res.status(201).json({ customer: await createCustomer(db, getAuth(res).organisationId, values) });
  });
  return router;
}

export function sitesRouter({ db }: Deps): Router {
  const router = Router();
  router.get("/", async (_req, res) => {
    res.json({ sites: await listSites(db, getAuth(res).organisationId) });
  });
  router.post("/", async (req, res) => {
    const values = SiteInputSchema.parse(req.body);
    const site = await createSite(db, getAuth(res).organisationId, values);
    if (!site) throw new HttpError(400, "Some fields need attention", { customerId: "Choose one of your customers" });
    res.status(201).json({ site });
  });
  return router;
}

export function equipmentRouter({ db }: Deps): Router {
  const router = Router();

  // A page at a time, searched and sorted by the server: an organisation may hold thousands of units.
  router.get("/", async (req, res) => {
    const query = EquipmentListQuerySchema.parse(req.query);
    const { rows, nextCursor } = await listEquipmentPage(db, getAuth(res).organisationId, query);
    res.json({ equipment: rows.map(toEquipment), nextCursor });
  });

  router.post("/", async (req, res) => {
    const values = EquipmentInputSchema.parse(req.body);
    const created = await createEquipment(db, getAuth(res).organisationId, values);
    if (!created) throw new HttpError(400, "Some fields need attention", { siteId: "Choose one of your sites" });
    res.status(201).json({ equipment: toEquipment(created) });
  });

  // Before "/:id": the refrigerants a device keeps the tables of for offline use.
  router.get("/refrigerants", async (_req, res) => {
    res.json({ refrigerants: await refrigerantsInUse(db, getAuth(res).organisationId) } satisfies RefrigerantsInUse);
  });

  router.get("/:id", async (req, res) => {
    const { organisationId } = getAuth(res);
    const id = parseId(req.params.id, "Equipment");
    const row = await getEquipment(db, organisationId, id);
    if (!row) throw notFound("Equipment");
    // The last settled state of each circuit, judged by the same trend rule as the run log, from
    // the tail of the latest visit only (server/equipment/last-settled-states.ts).
    const [visits, lastSettled] = await Promise.all([
      listVisits(db, organisationId, { equipmentId: id }),
      lastSettledStates(db, organisationId, id, row.circuits),
    ]);
    res.json({ equipment: toEquipment(row), visits, lastSettled } satisfies EquipmentDetail);
  });

  return router;
}
