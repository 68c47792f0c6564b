import type { MigrationInterface, QueryRunner } from "typeorm";

/** A project's optional site location (WGS84 latitude and longitude, degrees) and the bearing of plan north, for map exports. */
export class ProjectSiteLocation1796160000000 implements MigrationInterface {
  name = "ProjectSiteLocation1796160000000";

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "projects" ADD "site_lat_deg" double precision`);
    await queryRunner.query(`ALTER TABLE "projects" ADD "site_lon_deg" double precision`);
    await queryRunner.query(`ALTER TABLE "projects" ADD "plan_north_bearing_deg" double precision`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "projects" DROP COLUMN "plan_north_bearing_deg"`);
    await queryRunner.query(`ALTER TABLE "projects" DROP COLUMN "site_lon_deg"`);
    await queryRunner.query(`ALTER TABLE "projects" DROP COLUMN "site_lat_deg"`);
  }
}
