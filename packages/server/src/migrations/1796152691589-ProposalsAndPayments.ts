import { MigrationInterface, QueryRunner } from "typeorm";

export class ProposalsAndPayments1796152691589 implements MigrationInterface {
    name = 'ProposalsAndPayments1796152691589'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "proposals" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organization_id" uuid NOT NULL, "project_id" uuid NOT NULL, "scenario_id" uuid NOT NULL, "status" character varying(20) NOT NULL DEFAULT 'draft', "current_version" integer NOT NULL DEFAULT '1', "approved_by" uuid, "approved_by_name" character varying(200), "approved_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_db524c8db8e126a38a2f16d8cac" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_proposals_project" ON "proposals"  ("project_id") `);
        await queryRunner.query(`CREATE TABLE "payments" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organization_id" uuid NOT NULL, "proposal_id" uuid NOT NULL, "version" integer NOT NULL, "checkout_session_id" character varying(255) NOT NULL, "amount_minor" integer NOT NULL, "currency" character varying(3) NOT NULL, "status" character varying(10) NOT NULL DEFAULT 'pending', "failure_message" text, "requested_by" uuid NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "paid_at" TIMESTAMP WITH TIME ZONE, CONSTRAINT "PK_197ab7af18c93fbb0c9b28b4a59" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "ux_payments_checkout_session" ON "payments"  ("checkout_session_id") `);
        await queryRunner.query(`CREATE INDEX "ix_payments_proposal" ON "payments"  ("proposal_id") `);
        await queryRunner.query(`CREATE TABLE "payment_events" ("event_id" character varying(255) NOT NULL, "type" character varying(80) NOT NULL, "payment_id" uuid, "received_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_4f36a430ea944f1d250f0500d13" PRIMARY KEY ("event_id"))`);
        await queryRunner.query(`CREATE TABLE "firm_settings" ("organization_id" uuid NOT NULL, "currency" character varying(3) NOT NULL DEFAULT 'USD', "tax_rate_percent" numeric(5,2) NOT NULL DEFAULT '0', "deposit_percent" numeric(5,2) NOT NULL DEFAULT '30', "validity_days" integer NOT NULL DEFAULT '30', "terms" text NOT NULL DEFAULT '', "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_149a5aecf5efdc4f67443987ff9" PRIMARY KEY ("organization_id"))`);
        await queryRunner.query(`CREATE TABLE "price_book_items" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organization_id" uuid NOT NULL, "code" character varying(60) NOT NULL, "name" character varying(120) NOT NULL, "family" character varying(20) NOT NULL, "applies_to" jsonb NOT NULL, "effect" jsonb NOT NULL, "fixed_materials" numeric(12,2) NOT NULL DEFAULT '0', "fixed_labour" numeric(12,2) NOT NULL DEFAULT '0', "per_m2_materials" numeric(12,2) NOT NULL DEFAULT '0', "per_m2_labour" numeric(12,2) NOT NULL DEFAULT '0', "per_item_materials" numeric(12,2) NOT NULL DEFAULT '0', "per_item_labour" numeric(12,2) NOT NULL DEFAULT '0', "labour_hours" numeric(8,2) NOT NULL DEFAULT '0', "added_thickness_mm" numeric(6,1) NOT NULL DEFAULT '0', "flags" jsonb NOT NULL DEFAULT '[]', "cautions" jsonb NOT NULL DEFAULT '[]', "active" boolean NOT NULL DEFAULT true, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_df3a2094e7c4d1c4da05abd9285" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "ux_price_book_items_code" ON "price_book_items"  ("organization_id", "code") `);
        await queryRunner.query(`CREATE TABLE "proposal_comments" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "proposal_id" uuid NOT NULL, "version" integer NOT NULL, "kind" character varying(20) NOT NULL, "body" text NOT NULL, "author_user_id" uuid NOT NULL, "author_name" character varying(200) NOT NULL, "author_role" character varying(20) NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_3dad96e1019f8d511df6b116cc7" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_proposal_comments_proposal" ON "proposal_comments"  ("proposal_id") `);
        await queryRunner.query(`CREATE TABLE "proposal_versions" ("proposal_id" uuid NOT NULL, "version" integer NOT NULL, "content" jsonb NOT NULL, "scenario_snapshot" jsonb NOT NULL, "plan_document" jsonb NOT NULL, "sent_at" TIMESTAMP WITH TIME ZONE, "sent_by" uuid, "pdf_status" character varying(10) NOT NULL DEFAULT 'pending', "pdf" bytea, "pdf_error" text, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_f1ae1e36d8140e0dc9799f2aeb9" PRIMARY KEY ("proposal_id", "version"))`);
        await queryRunner.query(`CREATE TABLE "scenarios" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organization_id" uuid NOT NULL, "project_id" uuid NOT NULL, "name" character varying(120) NOT NULL, "setup" jsonb NOT NULL, "items" jsonb NOT NULL, "evaluation" jsonb, "created_by" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_a2af4912aab626639cca306b987" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_scenarios_project" ON "scenarios"  ("project_id") `);
        await queryRunner.query(`CREATE TABLE "verifications" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organization_id" uuid NOT NULL, "project_id" uuid NOT NULL, "proposal_id" uuid NOT NULL, "before_levels_db" jsonb NOT NULL, "after_levels_db" jsonb NOT NULL, "note" text NOT NULL DEFAULT '', "created_by" uuid NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_2127ad1b143cf012280390b01d1" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_verifications_proposal" ON "verifications"  ("proposal_id") `);
        await queryRunner.query(`CREATE TABLE "work_orders" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organization_id" uuid NOT NULL, "project_id" uuid NOT NULL, "proposal_id" uuid NOT NULL, "position" integer NOT NULL, "title" character varying(200) NOT NULL, "element_id" character varying(200) NOT NULL, "element_name" character varying(200) NOT NULL, "materials" jsonb NOT NULL, "steps" jsonb NOT NULL, "cautions" jsonb NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_29f6c1884082ee6f535aed93660" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_work_orders_project" ON "work_orders"  ("project_id") `);
        await queryRunner.query(`CREATE TABLE "work_order_tasks" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "work_order_id" uuid NOT NULL, "position" integer NOT NULL, "text" text NOT NULL, "status" character varying(10) NOT NULL DEFAULT 'todo', "assignee_membership_id" uuid, "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_d7c45197c5b372baf9f07496708" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_work_order_tasks_order" ON "work_order_tasks"  ("work_order_id") `);
        await queryRunner.query(`ALTER TABLE "proposals" ADD CONSTRAINT "FK_abf14bbfaf1a03909314317b4a4" FOREIGN KEY ("project_id") REFERENCES "projects"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "payments" ADD CONSTRAINT "FK_625451722d0d05ccdc0d66cbfb1" FOREIGN KEY ("proposal_id") REFERENCES "proposals"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "firm_settings" ADD CONSTRAINT "FK_149a5aecf5efdc4f67443987ff9" FOREIGN KEY ("organization_id") REFERENCES "organizations"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "price_book_items" ADD CONSTRAINT "FK_cbc939dcef15c983d1ac7155a26" FOREIGN KEY ("organization_id") REFERENCES "organizations"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "proposal_comments" ADD CONSTRAINT "FK_4d4223d615f11fed9024062ab5c" FOREIGN KEY ("proposal_id") REFERENCES "proposals"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "proposal_versions" ADD CONSTRAINT "FK_c6bcca84e48eebbe830bff776fa" FOREIGN KEY ("proposal_id") REFERENCES "proposals"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "scenarios" ADD CONSTRAINT "FK_94b416c1b68e090ce2c53a76b67" FOREIGN KEY ("project_id") REFERENCES "projects"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "verifications" ADD CONSTRAINT "FK_2bfa282338bc0b34901e1b1a8e0" FOREIGN KEY ("proposal_id") REFERENCES "proposals"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "work_orders" ADD CONSTRAINT "FK_1eb5024a2e48d2454264ab0e052" FOREIGN KEY ("proposal_id") REFERENCES "proposals"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "work_order_tasks" ADD CONSTRAINT "FK_09f4588dbc7ec1e246aeb6ee555" FOREIGN KEY ("work_order_id") REFERENCES "work_orders"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "work_order_tasks" DROP CONSTRAINT "FK_09f4588dbc7ec1e246aeb6ee555"`);
        await queryRunner.query(`ALTER TABLE "work_orders" DROP CONSTRAINT "FK_1eb5024a2e48d2454264ab0e052"`);
        await queryRunner.query(`ALTER TABLE "verifications" DROP CONSTRAINT "FK_2bfa282338bc0b34901e1b1a8e0"`);
        await queryRunner.query(`ALTER TABLE "scenarios" DROP CONSTRAINT "FK_94b416c1b68e090ce2c53a76b67"`);
        await queryRunner.query(`ALTER TABLE "proposal_versions" DROP CONSTRAINT "FK_c6bcca84e48eebbe830bff776fa"`);
        await queryRunner.query(`ALTER TABLE "proposal_comments" DROP CONSTRAINT "FK_4d4223d615f11fed9024062ab5c"`);
        await queryRunner.query(`ALTER TABLE "price_book_items" DROP CONSTRAINT "FK_cbc939dcef15c983d1ac7155a26"`);
        await queryRunner.query(`ALTER TABLE "firm_settings" DROP CONSTRAINT "FK_149a5aecf5efdc4f67443987ff9"`);
        await queryRunner.query(`ALTER TABLE "payments" DROP CONSTRAINT "FK_625451722d0d05ccdc0d66cbfb1"`);
        await queryRunner.query(`ALTER TABLE "proposals" DROP CONSTRAINT "FK_abf14bbfaf1a03909314317b4a4"`);
        await queryRunner.query(`DROP INDEX "ix_work_order_tasks_order"`);
        await queryRunner.query(`DROP TABLE "work_order_tasks"`);
        await queryRunner.query(`DROP INDEX "ix_work_orders_project"`);
        await queryRunner.query(`DROP TABLE "work_orders"`);
        await queryRunner.query(`DROP INDEX "ix_verifications_proposal"`);
        await queryRunner.query(`DROP TABLE "verifications"`);
        await queryRunner.query(`DROP INDEX "ix_scenarios_project"`);
        await queryRunner.query(`DROP TABLE "scenarios"`);
        await queryRunner.query(`DROP TABLE "proposal_versions"`);
        await queryRunner.query(`DROP INDEX "ix_proposal_comments_proposal"`);
        await queryRunner.query(`DROP TABLE "proposal_comments"`);
        await queryRunner.query(`DROP INDEX "ux_price_book_items_code"`);
        await queryRunner.query(`DROP TABLE "price_book_items"`);
        await queryRunner.query(`DROP TABLE "firm_settings"`);
        await queryRunner.query(`DROP TABLE "payment_events"`);
        await queryRunner.query(`DROP INDEX "ix_payments_proposal"`);
        await queryRunner.query(`DROP INDEX "ux_payments_checkout_session"`);
        await queryRunner.query(`DROP TABLE "payments"`);
        await queryRunner.query(`DROP INDEX "ix_proposals_project"`);
        await queryRunner.query(`DROP TABLE "proposals"`);
    }

}
