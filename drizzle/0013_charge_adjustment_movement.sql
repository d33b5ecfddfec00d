ALTER TABLE "adjustments" ADD COLUMN "movement_id" uuid;--> statement-breakpoint
ALTER TABLE "adjustments" ADD CONSTRAINT "adjustments_movement_id_refrigerant_movements_id_fk" FOREIGN KEY ("movement_id") REFERENCES "public"."refrigerant_movements"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "adjustments_movement_unique" ON "adjustments" USING btree ("movement_id") WHERE "adjustments"."movement_id" is not null;--> statement-breakpoint
-- Links charge adjustments stored before this migration to the register movement they
-- describe: same visit, circuit, direction (added/reused in, recovered out), refrigerant and
-- mass to the gram. Both sides are paired in time order, one to one; the rest stay unlinked
-- and the visit's refrigerant section names them as such.
WITH adjustment_side AS (
	SELECT a.id, row_number() OVER (
		PARTITION BY a.visit_id, a.circuit, a.kind, round(a.amount_kg::numeric, 3) ORDER BY a.at, a.created_at, a.id
	) AS position, a.visit_id, a.circuit, a.kind, round(a.amount_kg::numeric, 3) AS grams, e.refrigerant
	FROM "adjustments" a
	JOIN "visits" v ON v.id = a.visit_id
	JOIN "equipment" e ON e.id = v.equipment_id
	WHERE a.kind IN ('charge-added', 'charge-removed') AND a.amount_kg IS NOT NULL AND a.voided_at IS NULL AND a.movement_id IS NULL
), movement_side AS (
	SELECT m.id, row_number() OVER (
		PARTITION BY m.visit_id, m.circuit, m.kind = 'recovered', round(m.kg::numeric, 3) ORDER BY m.at, m.created_at, m.id
	) AS position, m.visit_id, m.circuit, CASE WHEN m.kind = 'recovered' THEN 'charge-removed' ELSE 'charge-added' END AS kind,
	round(m.kg::numeric, 3) AS grams, m.refrigerant
	FROM "refrigerant_movements" m
	WHERE m.visit_id IS NOT NULL AND m.kind IN ('recovered', 'reused', 'added-new', 'added-reclaimed') AND m.voided_at IS NULL
		AND NOT EXISTS (SELECT 1 FROM "adjustments" linked WHERE linked.movement_id = m.id)
), pairs AS (
	SELECT adjustment_side.id AS adjustment_id, movement_side.id AS movement_id
	FROM adjustment_side JOIN movement_side
		ON movement_side.visit_id = adjustment_side.visit_id AND movement_side.circuit = adjustment_side.circuit
		AND movement_side.kind = adjustment_side.kind AND movement_side.grams = adjustment_side.grams
		AND movement_side.refrigerant = adjustment_side.refrigerant AND movement_side.position = adjustment_side.position
)
UPDATE "adjustments" SET "movement_id" = pairs.movement_id FROM pairs WHERE "adjustments".id = pairs.adjustment_id;
