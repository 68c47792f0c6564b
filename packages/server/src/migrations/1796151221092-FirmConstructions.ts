import { MigrationInterface, QueryRunner } from "typeorm";

export class FirmConstructions1796151221092 implements MigrationInterface {
    name = 'FirmConstructions1796151221092'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "firm_constructions" ("organization_id" uuid NOT NULL, "construction_id" character varying(60) NOT NULL, "data" jsonb NOT NULL, "created_by" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_e9b23d15c07f22917fbde30d84d" PRIMARY KEY ("organization_id", "construction_id"))`);
        await queryRunner.query(`ALTER TABLE "firm_constructions" ADD CONSTRAINT "FK_fae5ec77aef5afb6b5d3d3db7df" FOREIGN KEY ("organization_id") REFERENCES "organizations"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "firm_constructions" DROP CONSTRAINT "FK_fae5ec77aef5afb6b5d3d3db7df"`);
        await queryRunner.query(`DROP TABLE "firm_constructions"`);
    }

}
