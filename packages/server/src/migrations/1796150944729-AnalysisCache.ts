import { MigrationInterface, QueryRunner } from "typeorm";

export class AnalysisCache1796150944729 implements MigrationInterface {
    name = 'AnalysisCache1796150944729'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "analysis_cache" ("project_id" uuid NOT NULL, "cache_key" character(64) NOT NULL, "plan_version" integer NOT NULL, "result" jsonb NOT NULL, "compute_ms" real NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_fd73dd7a3fb95670b5a468cbbe9" PRIMARY KEY ("project_id", "cache_key"))`);
        await queryRunner.query(`ALTER TABLE "analysis_cache" ADD CONSTRAINT "FK_128699379b0338b0ae3fdd0db05" FOREIGN KEY ("project_id") REFERENCES "projects"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "analysis_cache" DROP CONSTRAINT "FK_128699379b0338b0ae3fdd0db05"`);
        await queryRunner.query(`DROP TABLE "analysis_cache"`);
    }

}
