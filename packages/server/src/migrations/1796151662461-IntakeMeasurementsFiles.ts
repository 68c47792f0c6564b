import { MigrationInterface, QueryRunner } from "typeorm";

export class IntakeMeasurementsFiles1796151662461 implements MigrationInterface {
    name = 'IntakeMeasurementsFiles1796151662461'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "project_briefs" ("project_id" uuid NOT NULL, "version" integer NOT NULL DEFAULT '0', "format_version" integer NOT NULL DEFAULT '1', "brief" jsonb NOT NULL, "updated_by" uuid, "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_a9c5f893cd3d8dd0b85b18b63aa" PRIMARY KEY ("project_id"))`);
        await queryRunner.query(`CREATE TABLE "stored_files" ("id" uuid NOT NULL, "organization_id" uuid NOT NULL, "project_id" uuid NOT NULL, "object_key" character varying(300) NOT NULL, "content_type" character varying(100) NOT NULL, "size_bytes" bigint NOT NULL, "sha256" character(64) NOT NULL, "original_name" character varying(200) NOT NULL DEFAULT '', "state" character varying(16) NOT NULL DEFAULT 'receiving', "created_by" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "UQ_0a8766dd87c9ec99f69bc0d6629" UNIQUE ("object_key"), CONSTRAINT "PK_5d5be862bf53851c1794b4adf4e" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_stored_files_org" ON "stored_files"  ("organization_id") `);
        await queryRunner.query(`CREATE INDEX "ix_stored_files_project" ON "stored_files"  ("project_id") `);
        await queryRunner.query(`CREATE TABLE "measurements" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organization_id" uuid NOT NULL, "project_id" uuid NOT NULL, "label" character varying(120) NOT NULL, "kind" character varying(24) NOT NULL, "source" character varying(16) NOT NULL, "status" character varying(16) NOT NULL DEFAULT 'ready', "progress" real NOT NULL DEFAULT '1', "error" text, "taken_at" TIMESTAMP WITH TIME ZONE NOT NULL, "room_id" character varying(100), "point" jsonb, "device" character varying(120) NOT NULL DEFAULT '', "calibration_db" double precision NOT NULL DEFAULT '0', "leq_db" jsonb NOT NULL, "lmax_db" jsonb, "l10_db" jsonb, "l90_db" jsonb, "summary" jsonb, "time_history" jsonb, "events" jsonb, "event_settings" jsonb, "file_id" uuid, "created_by" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_3c0e7812563f27fd68e8271661b" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_measurements_org" ON "measurements"  ("organization_id") `);
        await queryRunner.query(`CREATE INDEX "ix_measurements_project" ON "measurements"  ("project_id") `);
        await queryRunner.query(`CREATE TABLE "photos" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organization_id" uuid NOT NULL, "project_id" uuid NOT NULL, "element_id" character varying(100), "measurement_id" uuid, "caption" character varying(300) NOT NULL DEFAULT '', "file_id" uuid NOT NULL, "thumbnail_file_id" uuid NOT NULL, "width" integer, "height" integer, "created_by" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_5220c45b8e32d49d767b9b3d725" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_photos_org" ON "photos"  ("organization_id") `);
        await queryRunner.query(`CREATE INDEX "ix_photos_project" ON "photos"  ("project_id") `);
        await queryRunner.query(`ALTER TABLE "project_briefs" ADD CONSTRAINT "FK_a9c5f893cd3d8dd0b85b18b63aa" FOREIGN KEY ("project_id") REFERENCES "projects"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "stored_files" ADD CONSTRAINT "FK_a27e4c9803c954e917700d3d9e6" FOREIGN KEY ("project_id") REFERENCES "projects"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "measurements" ADD CONSTRAINT "FK_b71e8e8eaf8c36fe607818e7649" FOREIGN KEY ("project_id") REFERENCES "projects"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "measurements" ADD CONSTRAINT "FK_7d7dfccd5b11a5fb319bbe1b453" FOREIGN KEY ("file_id") REFERENCES "stored_files"("id") ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "photos" ADD CONSTRAINT "FK_a12c0b5b4be405f79ce102173e6" FOREIGN KEY ("project_id") REFERENCES "projects"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "photos" ADD CONSTRAINT "FK_80eefd11f7135bdac1bd2567233" FOREIGN KEY ("measurement_id") REFERENCES "measurements"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "photos" ADD CONSTRAINT "FK_74cddc631a7e4a5a69b91839b63" FOREIGN KEY ("file_id") REFERENCES "stored_files"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "photos" ADD CONSTRAINT "FK_799a631f58c5400de3a5c5fc1ff" FOREIGN KEY ("thumbnail_file_id") REFERENCES "stored_files"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "photos" DROP CONSTRAINT "FK_799a631f58c5400de3a5c5fc1ff"`);
        await queryRunner.query(`ALTER TABLE "photos" DROP CONSTRAINT "FK_74cddc631a7e4a5a69b91839b63"`);
        await queryRunner.query(`ALTER TABLE "photos" DROP CONSTRAINT "FK_80eefd11f7135bdac1bd2567233"`);
        await queryRunner.query(`ALTER TABLE "photos" DROP CONSTRAINT "FK_a12c0b5b4be405f79ce102173e6"`);
        await queryRunner.query(`ALTER TABLE "measurements" DROP CONSTRAINT "FK_7d7dfccd5b11a5fb319bbe1b453"`);
        await queryRunner.query(`ALTER TABLE "measurements" DROP CONSTRAINT "FK_b71e8e8eaf8c36fe607818e7649"`);
        await queryRunner.query(`ALTER TABLE "stored_files" DROP CONSTRAINT "FK_a27e4c9803c954e917700d3d9e6"`);
        await queryRunner.query(`ALTER TABLE "project_briefs" DROP CONSTRAINT "FK_a9c5f893cd3d8dd0b85b18b63aa"`);
        await queryRunner.query(`DROP INDEX "ix_photos_project"`);
        await queryRunner.query(`DROP INDEX "ix_photos_org"`);
        await queryRunner.query(`DROP TABLE "photos"`);
        await queryRunner.query(`DROP INDEX "ix_measurements_project"`);
        await queryRunner.query(`DROP INDEX "ix_measurements_org"`);
        await queryRunner.query(`DROP TABLE "measurements"`);
        await queryRunner.query(`DROP INDEX "ix_stored_files_project"`);
        await queryRunner.query(`DROP INDEX "ix_stored_files_org"`);
        await queryRunner.query(`DROP TABLE "stored_files"`);
        await queryRunner.query(`DROP TABLE "project_briefs"`);
    }

}
