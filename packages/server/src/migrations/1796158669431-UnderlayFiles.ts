import { MigrationInterface, QueryRunner } from "typeorm";

export class UnderlayFiles1796158669431 implements MigrationInterface {
    name = 'UnderlayFiles1796158669431'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "underlay_files" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organization_id" uuid NOT NULL, "project_id" uuid NOT NULL, "file_id" uuid NOT NULL, "name" character varying(200) NOT NULL DEFAULT '', "source" character varying(16) NOT NULL DEFAULT 'image', "page" integer, "width_px" integer NOT NULL, "height_px" integer NOT NULL, "created_by" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_7882ea8abc70fdd7011ca8c3167" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_underlay_files_org" ON "underlay_files"  ("organization_id") `);
        await queryRunner.query(`CREATE INDEX "ix_underlay_files_project" ON "underlay_files"  ("project_id") `);
        await queryRunner.query(`ALTER TABLE "underlay_files" ADD CONSTRAINT "FK_62c9d5e4d0b794b0f2bf66c14b6" FOREIGN KEY ("project_id") REFERENCES "projects"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "underlay_files" ADD CONSTRAINT "FK_166ae9db8972527957d69205a9e" FOREIGN KEY ("file_id") REFERENCES "stored_files"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "underlay_files" DROP CONSTRAINT "FK_166ae9db8972527957d69205a9e"`);
        await queryRunner.query(`ALTER TABLE "underlay_files" DROP CONSTRAINT "FK_62c9d5e4d0b794b0f2bf66c14b6"`);
        await queryRunner.query(`DROP INDEX "ix_underlay_files_project"`);
        await queryRunner.query(`DROP INDEX "ix_underlay_files_org"`);
        await queryRunner.query(`DROP TABLE "underlay_files"`);
    }

}
