import { Column, Entity, PrimaryColumn, UpdateDateColumn } from "typeorm";
import type { PaperSize } from "@waymark/contract";
import type { Adjustment, Policy } from "@waymark/stats";
import { DATETIME, DOUBLE } from "../../db/column-types.js";

/** The organization's single settings row (id 1). */
@Entity({ name: "organization_settings" })
export class OrganizationSettings {
  @PrimaryColumn("integer")
  id: number;

  @Column("varchar", { length: 20 })
  policy: Policy;

  @Column(DOUBLE, { name: "default_alpha" })
  defaultAlpha: number;

  @Column("varchar", { name: "default_adjust", length: 12 })
  defaultAdjust: Adjustment;

  @Column("varchar", { name: "paper_size", length: 8 })
  paperSize: PaperSize;

  @UpdateDateColumn({ name: "updated_at", type: DATETIME })
  updatedAt: Date;
}
