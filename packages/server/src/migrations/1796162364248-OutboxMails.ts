import { MigrationInterface, QueryRunner } from "typeorm";

export class OutboxMails1796162364248 implements MigrationInterface {
    name = 'OutboxMails1796162364248'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "outbox_mails" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organization_id" uuid, "kind" character varying(40) NOT NULL, "idempotency_key" character varying(200) NOT NULL, "to_address" character varying(254) NOT NULL, "subject" character varying(300) NOT NULL, "text_body" text NOT NULL, "html_body" text, "status" character varying(10) NOT NULL DEFAULT 'pending', "attempts" integer NOT NULL DEFAULT '0', "last_error" text, "next_attempt_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "sent_at" TIMESTAMP WITH TIME ZONE, CONSTRAINT "PK_b29f3864833e0d790528753c19c" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "ux_outbox_mails_key" ON "outbox_mails"  ("idempotency_key") `);
        await queryRunner.query(`CREATE INDEX "ix_outbox_mails_due" ON "outbox_mails"  ("status", "next_attempt_at") `);
    }

    // Unqualified names: the migration check undoes this in a schema of its own and must leave public alone.
    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "ix_outbox_mails_due"`);
        await queryRunner.query(`DROP INDEX "ux_outbox_mails_key"`);
        await queryRunner.query(`DROP TABLE "outbox_mails"`);
    }

}
