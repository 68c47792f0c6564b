import { MigrationInterface, QueryRunner } from "typeorm";

export class InitialSchema1796149875228 implements MigrationInterface {
    name = 'InitialSchema1796149875228'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "audit_events" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organization_id" uuid, "actor_user_id" uuid, "action" character varying(64) NOT NULL, "entity_type" character varying(40) NOT NULL, "entity_id" character varying(64), "data" jsonb NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_910f64d901a5c3e9878f0d4a407" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_audit_events_org_time" ON "audit_events"  ("organization_id", "created_at") `);
        await queryRunner.query(`CREATE TABLE "organizations" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "name" character varying(120) NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_6b031fcd0863e3f6b44230163f9" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE TABLE "invitations" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organization_id" uuid NOT NULL, "email" character varying(254) NOT NULL, "role" character varying(16) NOT NULL, "display_name" character varying(120), "token_hash" character(64) NOT NULL, "invited_by" uuid, "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL, "accepted_at" TIMESTAMP WITH TIME ZONE, "revoked_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_5dec98cfdfd562e4ad3648bbb07" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_invitations_org" ON "invitations"  ("organization_id") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "uq_invitations_token_hash" ON "invitations"  ("token_hash") `);
        await queryRunner.query(`CREATE TABLE "users" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "email" character varying(254) NOT NULL, "display_name" character varying(120) NOT NULL, "password_hash" character varying(255) NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_a3ffb1c0c8416b9fc6f907b7433" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "uq_users_email" ON "users"  ("email") `);
        await queryRunner.query(`CREATE TABLE "memberships" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "user_id" uuid NOT NULL, "organization_id" uuid NOT NULL, "role" character varying(16) NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_25d28bd932097a9e90495ede7b4" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_memberships_org" ON "memberships"  ("organization_id") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "uq_memberships_user_org" ON "memberships"  ("user_id", "organization_id") `);
        await queryRunner.query(`CREATE TABLE "password_resets" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "user_id" uuid NOT NULL, "token_hash" character(64) NOT NULL, "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL, "used_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_4816377aa98211c1de34469e742" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "uq_password_resets_token_hash" ON "password_resets"  ("token_hash") `);
        await queryRunner.query(`CREATE TABLE "projects" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organization_id" uuid NOT NULL, "title" character varying(160) NOT NULL, "site_address" character varying(300) NOT NULL DEFAULT '', "status" character varying(24) NOT NULL DEFAULT 'brief', "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_6271df0a7aed1d6c0691ce6ac50" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_projects_org" ON "projects"  ("organization_id") `);
        await queryRunner.query(`CREATE TABLE "plan_revisions" ("project_id" uuid NOT NULL, "version" integer NOT NULL, "document" jsonb NOT NULL, "saved_by" uuid, "message" character varying(200), "saved_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_2bb321d2aaca0cc6d5571f12163" PRIMARY KEY ("project_id", "version"))`);
        await queryRunner.query(`CREATE TABLE "plans" ("project_id" uuid NOT NULL, "document" jsonb NOT NULL, "version" integer NOT NULL DEFAULT '0', "updated_by" uuid, "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_dc1f43af02c0a99dbf4c8a2b532" PRIMARY KEY ("project_id"))`);
        await queryRunner.query(`CREATE TABLE "project_clients" ("project_id" uuid NOT NULL, "membership_id" uuid NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_c5c53781a53aa1708bc486a2e18" PRIMARY KEY ("project_id", "membership_id"))`);
        await queryRunner.query(`CREATE INDEX "ix_project_clients_membership" ON "project_clients"  ("membership_id") `);
        await queryRunner.query(`CREATE TABLE "rate_limit_buckets" ("key" character varying(300) NOT NULL, "hits" integer NOT NULL DEFAULT '0', "reset_at" TIMESTAMP WITH TIME ZONE NOT NULL, CONSTRAINT "PK_9eb2f8a2ae370667b4ca83dd313" PRIMARY KEY ("key"))`);
        await queryRunner.query(`CREATE TABLE "sessions" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "user_id" uuid NOT NULL, "family_id" uuid NOT NULL, "token_hash" character(64) NOT NULL, "membership_id" uuid NOT NULL, "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL, "used_at" TIMESTAMP WITH TIME ZONE, "revoked_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_3238ef96f18b355b671619111bc" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_sessions_user" ON "sessions"  ("user_id") `);
        await queryRunner.query(`CREATE INDEX "ix_sessions_family" ON "sessions"  ("family_id") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "uq_sessions_token_hash" ON "sessions"  ("token_hash") `);
        await queryRunner.query(`ALTER TABLE "invitations" ADD CONSTRAINT "FK_42d1dbb4d85dc3643fdc6560af0" FOREIGN KEY ("organization_id") REFERENCES "organizations"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "memberships" ADD CONSTRAINT "FK_7c1e2fdfed4f6838e0c05ae5051" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "memberships" ADD CONSTRAINT "FK_e5380c394ec7912046d07b54290" FOREIGN KEY ("organization_id") REFERENCES "organizations"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "password_resets" ADD CONSTRAINT "FK_f7a4c3bc48f24df007936d217be" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "projects" ADD CONSTRAINT "FK_585c8ce06628c70b70100bfb842" FOREIGN KEY ("organization_id") REFERENCES "organizations"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "plan_revisions" ADD CONSTRAINT "FK_24caffedabe4fe2d722a32e47b6" FOREIGN KEY ("project_id") REFERENCES "projects"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "plan_revisions" ADD CONSTRAINT "FK_d4bd8880e42bae62d26071c99c2" FOREIGN KEY ("saved_by") REFERENCES "users"("id") ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "plans" ADD CONSTRAINT "FK_dc1f43af02c0a99dbf4c8a2b532" FOREIGN KEY ("project_id") REFERENCES "projects"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "plans" ADD CONSTRAINT "FK_ed664d2dcfa4917b737773b91b5" FOREIGN KEY ("updated_by") REFERENCES "users"("id") ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "project_clients" ADD CONSTRAINT "FK_b99f3d906106dbc74621bce4511" FOREIGN KEY ("project_id") REFERENCES "projects"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "project_clients" ADD CONSTRAINT "FK_981ce10787d0e7bd0ffba23fc0b" FOREIGN KEY ("membership_id") REFERENCES "memberships"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "sessions" ADD CONSTRAINT "FK_085d540d9f418cfbdc7bd55bb19" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "sessions" DROP CONSTRAINT "FK_085d540d9f418cfbdc7bd55bb19"`);
        await queryRunner.query(`ALTER TABLE "project_clients" DROP CONSTRAINT "FK_981ce10787d0e7bd0ffba23fc0b"`);
        await queryRunner.query(`ALTER TABLE "project_clients" DROP CONSTRAINT "FK_b99f3d906106dbc74621bce4511"`);
        await queryRunner.query(`ALTER TABLE "plans" DROP CONSTRAINT "FK_ed664d2dcfa4917b737773b91b5"`);
        await queryRunner.query(`ALTER TABLE "plans" DROP CONSTRAINT "FK_dc1f43af02c0a99dbf4c8a2b532"`);
        await queryRunner.query(`ALTER TABLE "plan_revisions" DROP CONSTRAINT "FK_d4bd8880e42bae62d26071c99c2"`);
        await queryRunner.query(`ALTER TABLE "plan_revisions" DROP CONSTRAINT "FK_24caffedabe4fe2d722a32e47b6"`);
        await queryRunner.query(`ALTER TABLE "projects" DROP CONSTRAINT "FK_585c8ce06628c70b70100bfb842"`);
        await queryRunner.query(`ALTER TABLE "password_resets" DROP CONSTRAINT "FK_f7a4c3bc48f24df007936d217be"`);
        await queryRunner.query(`ALTER TABLE "memberships" DROP CONSTRAINT "FK_e5380c394ec7912046d07b54290"`);
        await queryRunner.query(`ALTER TABLE "memberships" DROP CONSTRAINT "FK_7c1e2fdfed4f6838e0c05ae5051"`);
        await queryRunner.query(`ALTER TABLE "invitations" DROP CONSTRAINT "FK_42d1dbb4d85dc3643fdc6560af0"`);
        await queryRunner.query(`DROP INDEX "uq_sessions_token_hash"`);
        await queryRunner.query(`DROP INDEX "ix_sessions_family"`);
        await queryRunner.query(`DROP INDEX "ix_sessions_user"`);
        await queryRunner.query(`DROP TABLE "sessions"`);
        await queryRunner.query(`DROP TABLE "rate_limit_buckets"`);
        await queryRunner.query(`DROP INDEX "ix_project_clients_membership"`);
        await queryRunner.query(`DROP TABLE "project_clients"`);
        await queryRunner.query(`DROP TABLE "plans"`);
        await queryRunner.query(`DROP TABLE "plan_revisions"`);
        await queryRunner.query(`DROP INDEX "ix_projects_org"`);
        await queryRunner.query(`DROP TABLE "projects"`);
        await queryRunner.query(`DROP INDEX "uq_password_resets_token_hash"`);
        await queryRunner.query(`DROP TABLE "password_resets"`);
        await queryRunner.query(`DROP INDEX "uq_memberships_user_org"`);
        await queryRunner.query(`DROP INDEX "ix_memberships_org"`);
        await queryRunner.query(`DROP TABLE "memberships"`);
        await queryRunner.query(`DROP INDEX "uq_users_email"`);
        await queryRunner.query(`DROP TABLE "users"`);
        await queryRunner.query(`DROP INDEX "uq_invitations_token_hash"`);
        await queryRunner.query(`DROP INDEX "ix_invitations_org"`);
        await queryRunner.query(`DROP TABLE "invitations"`);
        await queryRunner.query(`DROP TABLE "organizations"`);
        await queryRunner.query(`DROP INDEX "ix_audit_events_org_time"`);
        await queryRunner.query(`DROP TABLE "audit_events"`);
    }

}
