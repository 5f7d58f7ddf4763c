ALTER TABLE "greens" ADD COLUMN "squad_id" uuid;--> statement-breakpoint
ALTER TABLE "greens" ADD CONSTRAINT "greens_squad_id_squads_id_fk" FOREIGN KEY ("squad_id") REFERENCES "public"."squads"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "greens_squad_idx" ON "greens" USING btree ("squad_id");