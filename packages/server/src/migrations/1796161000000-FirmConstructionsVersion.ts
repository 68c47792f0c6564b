import type { MigrationInterface, QueryRunner } from "typeorm";

/** A per-firm counter bumped with every change to its own constructions (server processes key their copy of the catalogue by it). */
export class FirmConstructionsVersion1796161000000 implements MigrationInterface {
  name = "FirmConstructionsVersion1796161000000";

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "organizations" ADD "constructions_version" integer NOT NULL DEFAULT '0'`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "organizations" DROP COLUMN "constructions_version"`);
  }
}
