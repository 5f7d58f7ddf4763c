ALTER TABLE "invitations" ADD COLUMN "share_token_hash" text;--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_share_token_hash_unique" UNIQUE("share_token_hash");