import { MigrationInterface, QueryRunner } from "typeorm";

export class OptionSearches1796158450587 implements MigrationInterface {
    name = 'OptionSearches1796158450587'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "option_searches" ("id" uuid NOT NULL, "organization_id" uuid NOT NULL, "project_id" uuid NOT NULL, "status" character varying(12) NOT NULL, "progress" jsonb NOT NULL, "error" text, "result" jsonb, "cancel_requested" boolean NOT NULL DEFAULT false, "heartbeat_at" TIMESTAMP WITH TIME ZONE NOT NULL, "finished_at" TIMESTAMP WITH TIME ZONE, "created_by" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_d2f4f2c053a92148b4c4f8fdd8d" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_option_searches_project" ON "option_searches"  ("project_id") `);
        await queryRunner.query(`ALTER TABLE "option_searches" ADD CONSTRAINT "FK_101df1ad7ecdccb8e7a0476d907" FOREIGN KEY ("project_id") REFERENCES "projects"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "option_searches" DROP CONSTRAINT "FK_101df1ad7ecdccb8e7a0476d907"`);
        await queryRunner.query(`DROP INDEX "ix_option_searches_project"`);
        await queryRunner.query(`DROP TABLE "option_searches"`);
    }

}
