CREATE TABLE `api_tokens` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36) NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`name` varchar(80) NOT NULL,
	`token_hash` varchar(64) NOT NULL,
	`last_used_at` datetime(3),
	`revoked_at` datetime(3),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `api_tokens_id` PRIMARY KEY(`id`),
	CONSTRAINT `api_tokens_hash_uq` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `invitations` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36) NOT NULL,
	`email` varchar(254) NOT NULL,
	`name` varchar(120) NOT NULL,
	`roles` json NOT NULL,
	`token_hash` varchar(64) NOT NULL,
	`invited_by` varchar(36) NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	`accepted_at` datetime(3),
	`accepted_user_id` varchar(36),
	`revoked_at` datetime(3),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `invitations_id` PRIMARY KEY(`id`),
	CONSTRAINT `invitations_token_uq` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `memberships` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36) NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`roles` json NOT NULL,
	`active` boolean NOT NULL DEFAULT true,
	`deactivated_at` datetime(3),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `memberships_id` PRIMARY KEY(`id`),
	CONSTRAINT `memberships_workspace_user_uq` UNIQUE(`workspace_id`,`user_id`)
);
--> statement-breakpoint
CREATE TABLE `users` (
	`id` varchar(36) NOT NULL,
	`email` varchar(254) NOT NULL,
	`name` varchar(120) NOT NULL,
	`password_hash` varchar(255),
	`active` boolean NOT NULL DEFAULT true,
	`last_sign_in_at` datetime(3),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `users_id` PRIMARY KEY(`id`),
	CONSTRAINT `users_email_uq` UNIQUE(`email`)
);
--> statement-breakpoint
CREATE TABLE `workspace_settings` (
	`workspace_id` varchar(36) NOT NULL,
	`calibration_age_limit_days` int NOT NULL DEFAULT 7,
	`warning_share` double NOT NULL DEFAULT 0.8,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `workspace_settings_workspace_id` PRIMARY KEY(`workspace_id`)
);
--> statement-breakpoint
CREATE TABLE `workspaces` (
	`id` varchar(36) NOT NULL,
	`slug` varchar(60) NOT NULL,
	`name` varchar(120) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `workspaces_id` PRIMARY KEY(`id`),
	CONSTRAINT `workspaces_slug_uq` UNIQUE(`slug`)
);
--> statement-breakpoint
CREATE TABLE `machine_versions` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36) NOT NULL,
	`machine_id` varchar(36) NOT NULL,
	`version` int NOT NULL,
	`model` json NOT NULL,
	`head_pivot_mm` double,
	`post_id` varchar(64) NOT NULL,
	`note` varchar(500),
	`created_by` varchar(36),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `machine_versions_id` PRIMARY KEY(`id`),
	CONSTRAINT `machine_versions_machine_version_uq` UNIQUE(`machine_id`,`version`)
);
--> statement-breakpoint
CREATE TABLE `machines` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36) NOT NULL,
	`name` varchar(120) NOT NULL,
	`layout` enum('three-axis','table-table','head-table','head-head') NOT NULL,
	`controller` varchar(80),
	`notes` text,
	`current_version_id` varchar(36),
	`archived_at` datetime(3),
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `machines_id` PRIMARY KEY(`id`),
	CONSTRAINT `machines_workspace_name_uq` UNIQUE(`workspace_id`,`name`)
);
--> statement-breakpoint
CREATE TABLE `probe_calibrations` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36) NOT NULL,
	`probe_id` varchar(36) NOT NULL,
	`kind` enum('calibration','stylus-change','collision') NOT NULL,
	`occurred_at` datetime(3) NOT NULL,
	`effective_diameter_mm` double,
	`repeatability_2sigma_mm` double,
	`reference` varchar(200),
	`note` varchar(500),
	`recorded_by` varchar(36),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `probe_calibrations_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `probes` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36) NOT NULL,
	`name` varchar(120) NOT NULL,
	`stylus_diameter_mm` double NOT NULL,
	`effective_diameter_mm` double,
	`stylus_length_mm` double NOT NULL,
	`repeatability_2sigma_mm` double NOT NULL,
	`approach_mm` double NOT NULL,
	`overtravel_mm` double NOT NULL,
	`clearance_mm` double NOT NULL,
	`fast_feed_mm_per_min` double NOT NULL,
	`measure_feed_mm_per_min` double NOT NULL,
	`archived_at` datetime(3),
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `probes_id` PRIMARY KEY(`id`),
	CONSTRAINT `probes_workspace_name_uq` UNIQUE(`workspace_id`,`name`)
);
--> statement-breakpoint
CREATE TABLE `datums` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36) NOT NULL,
	`part_id` varchar(36) NOT NULL,
	`letter` varchar(1) NOT NULL,
	`feature_id` varchar(36) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `datums_id` PRIMARY KEY(`id`),
	CONSTRAINT `datums_part_letter_uq` UNIQUE(`part_id`,`letter`)
);
--> statement-breakpoint
CREATE TABLE `features` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36) NOT NULL,
	`part_id` varchar(36) NOT NULL,
	`type` enum('plane','bore','boss','slot','web','sphere') NOT NULL,
	`label` varchar(40) NOT NULL,
	`geometry` json NOT NULL,
	`point_options` json NOT NULL,
	`sort_order` int NOT NULL DEFAULT 0,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `features_id` PRIMARY KEY(`id`),
	CONSTRAINT `features_part_label_uq` UNIQUE(`part_id`,`label`)
);
--> statement-breakpoint
CREATE TABLE `parts` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36) NOT NULL,
	`number` varchar(100) NOT NULL,
	`revision` varchar(20) NOT NULL,
	`name` varchar(200) NOT NULL,
	`material` varchar(60),
	`notes` text,
	`archived_at` datetime(3),
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `parts_id` PRIMARY KEY(`id`),
	CONSTRAINT `parts_workspace_number_rev_uq` UNIQUE(`workspace_id`,`number`,`revision`)
);
--> statement-breakpoint
CREATE TABLE `tolerances` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36) NOT NULL,
	`part_id` varchar(36) NOT NULL,
	`feature_id` varchar(36) NOT NULL,
	`characteristic` enum('diameter','width','position','flatness','circularity','cylindricity','perpendicularity','parallelism','profile') NOT NULL,
	`value` double,
	`upper` double,
	`lower` double,
	`fit` varchar(20),
	`material` enum('MMC','LMC','RFS'),
	`datums` json NOT NULL,
	`reference` varchar(40),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `tolerances_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `programs` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36) NOT NULL,
	`name` varchar(160) NOT NULL,
	`part_id` varchar(36) NOT NULL,
	`machine_id` varchar(36) NOT NULL,
	`machine_version_id` varchar(36) NOT NULL,
	`probe_id` varchar(36) NOT NULL,
	`post_id` varchar(64) NOT NULL,
	`linked_from_program_id` varchar(36),
	`created_by` varchar(36) NOT NULL,
	`archived_at` datetime(3),
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `programs_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `review_decisions` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36) NOT NULL,
	`revision_id` varchar(36) NOT NULL,
	`reviewer_id` varchar(36) NOT NULL,
	`decision` enum('approved','sent-back','comment') NOT NULL,
	`comment` text,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `review_decisions_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `revisions` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36) NOT NULL,
	`program_id` varchar(36) NOT NULL,
	`number` int NOT NULL,
	`author_id` varchar(36) NOT NULL,
	`message` varchar(500) NOT NULL,
	`status` enum('draft','in-review','approved','sent-back') NOT NULL DEFAULT 'draft',
	`program_text` longtext NOT NULL,
	`sha256` varchar(64) NOT NULL,
	`plan` json NOT NULL,
	`findings` json NOT NULL,
	`base_revision_id` varchar(36),
	`submitted_at` datetime(3),
	`approver_id` varchar(36),
	`approved_at` datetime(3),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `revisions_id` PRIMARY KEY(`id`),
	CONSTRAINT `revisions_program_number_uq` UNIQUE(`program_id`,`number`)
);
--> statement-breakpoint
CREATE TABLE `touch_points` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36) NOT NULL,
	`revision_id` varchar(36) NOT NULL,
	`uuid` varchar(36) NOT NULL,
	`feature_id` varchar(36) NOT NULL,
	`seq` int NOT NULL,
	`geometry` json NOT NULL,
	`axes` json NOT NULL,
	CONSTRAINT `touch_points_id` PRIMARY KEY(`id`),
	CONSTRAINT `touch_points_revision_uuid_uq` UNIQUE(`revision_id`,`uuid`)
);
--> statement-breakpoint
CREATE TABLE `corrections` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36) NOT NULL,
	`run_id` varchar(36) NOT NULL,
	`kind` varchar(40) NOT NULL,
	`register` varchar(40) NOT NULL,
	`old_value` double,
	`new_value` double NOT NULL,
	`code` text NOT NULL,
	`applied` boolean NOT NULL DEFAULT false,
	`applied_by` varchar(36),
	`applied_at` datetime(3),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `corrections_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `measurements` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36) NOT NULL,
	`run_id` varchar(36) NOT NULL,
	`touch_point_uuid` varchar(36) NOT NULL,
	`x_mm` double NOT NULL,
	`y_mm` double NOT NULL,
	`z_mm` double NOT NULL,
	CONSTRAINT `measurements_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `results` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36) NOT NULL,
	`run_id` varchar(36) NOT NULL,
	`tolerance_id` varchar(36) NOT NULL,
	`characteristic` varchar(40) NOT NULL,
	`value` double,
	`nominal` double,
	`lower_limit` double,
	`upper_limit` double,
	`bonus` double,
	`status` enum('conforming','marginal','nonconforming','not-evaluated') NOT NULL,
	`uncertainty` double,
	`decision_rule` varchar(40) NOT NULL,
	`details` json NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `results_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `runs` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36) NOT NULL,
	`revision_id` varchar(36) NOT NULL,
	`serial` varchar(80) NOT NULL,
	`temperature_c` double,
	`simulated` boolean NOT NULL DEFAULT false,
	`uploaded_by` varchar(36) NOT NULL,
	`measured_at` datetime(3),
	`notes` text,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `runs_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `audit_events` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36),
	`actor_user_id` varchar(36),
	`actor_email` varchar(254),
	`action` varchar(64) NOT NULL,
	`target_type` varchar(40),
	`target_id` varchar(64),
	`summary` varchar(500) NOT NULL,
	`details` json NOT NULL,
	`ip` varchar(64),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `audit_events_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `mail_outbox` (
	`id` varchar(36) NOT NULL,
	`workspace_id` varchar(36),
	`kind` varchar(40) NOT NULL,
	`to_address` varchar(254) NOT NULL,
	`subject` varchar(200) NOT NULL,
	`text_body` text NOT NULL,
	`html_body` text,
	`status` enum('pending','sent','failed') NOT NULL DEFAULT 'pending',
	`attempts` int NOT NULL DEFAULT 0,
	`last_error` varchar(500),
	`next_attempt_at` datetime(3) NOT NULL,
	`sent_at` datetime(3),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `mail_outbox_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `sign_in_attempts` (
	`id` varchar(36) NOT NULL,
	`email` varchar(254) NOT NULL,
	`ip` varchar(64) NOT NULL,
	`success` boolean NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `sign_in_attempts_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `api_tokens` ADD CONSTRAINT `api_tokens_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `api_tokens` ADD CONSTRAINT `api_tokens_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invitations` ADD CONSTRAINT `invitations_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invitations` ADD CONSTRAINT `invitations_invited_by_users_id_fk` FOREIGN KEY (`invited_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invitations` ADD CONSTRAINT `invitations_accepted_user_id_users_id_fk` FOREIGN KEY (`accepted_user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `memberships` ADD CONSTRAINT `memberships_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `memberships` ADD CONSTRAINT `memberships_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `workspace_settings` ADD CONSTRAINT `workspace_settings_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `machine_versions` ADD CONSTRAINT `machine_versions_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `machine_versions` ADD CONSTRAINT `machine_versions_machine_id_machines_id_fk` FOREIGN KEY (`machine_id`) REFERENCES `machines`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `machine_versions` ADD CONSTRAINT `machine_versions_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `machines` ADD CONSTRAINT `machines_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `probe_calibrations` ADD CONSTRAINT `probe_calibrations_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `probe_calibrations` ADD CONSTRAINT `probe_calibrations_probe_id_probes_id_fk` FOREIGN KEY (`probe_id`) REFERENCES `probes`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `probe_calibrations` ADD CONSTRAINT `probe_calibrations_recorded_by_users_id_fk` FOREIGN KEY (`recorded_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `probes` ADD CONSTRAINT `probes_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `datums` ADD CONSTRAINT `datums_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `datums` ADD CONSTRAINT `datums_part_id_parts_id_fk` FOREIGN KEY (`part_id`) REFERENCES `parts`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `datums` ADD CONSTRAINT `datums_feature_id_features_id_fk` FOREIGN KEY (`feature_id`) REFERENCES `features`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `features` ADD CONSTRAINT `features_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `features` ADD CONSTRAINT `features_part_id_parts_id_fk` FOREIGN KEY (`part_id`) REFERENCES `parts`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `parts` ADD CONSTRAINT `parts_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `tolerances` ADD CONSTRAINT `tolerances_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `tolerances` ADD CONSTRAINT `tolerances_part_id_parts_id_fk` FOREIGN KEY (`part_id`) REFERENCES `parts`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `tolerances` ADD CONSTRAINT `tolerances_feature_id_features_id_fk` FOREIGN KEY (`feature_id`) REFERENCES `features`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `programs` ADD CONSTRAINT `programs_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `programs` ADD CONSTRAINT `programs_part_id_parts_id_fk` FOREIGN KEY (`part_id`) REFERENCES `parts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `programs` ADD CONSTRAINT `programs_machine_id_machines_id_fk` FOREIGN KEY (`machine_id`) REFERENCES `machines`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `programs` ADD CONSTRAINT `programs_machine_version_id_machine_versions_id_fk` FOREIGN KEY (`machine_version_id`) REFERENCES `machine_versions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `programs` ADD CONSTRAINT `programs_probe_id_probes_id_fk` FOREIGN KEY (`probe_id`) REFERENCES `probes`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `programs` ADD CONSTRAINT `programs_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `review_decisions` ADD CONSTRAINT `review_decisions_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `review_decisions` ADD CONSTRAINT `review_decisions_revision_id_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `revisions`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `review_decisions` ADD CONSTRAINT `review_decisions_reviewer_id_users_id_fk` FOREIGN KEY (`reviewer_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revisions` ADD CONSTRAINT `revisions_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revisions` ADD CONSTRAINT `revisions_program_id_programs_id_fk` FOREIGN KEY (`program_id`) REFERENCES `programs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revisions` ADD CONSTRAINT `revisions_author_id_users_id_fk` FOREIGN KEY (`author_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revisions` ADD CONSTRAINT `revisions_approver_id_users_id_fk` FOREIGN KEY (`approver_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `touch_points` ADD CONSTRAINT `touch_points_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `touch_points` ADD CONSTRAINT `touch_points_revision_id_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `revisions`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `touch_points` ADD CONSTRAINT `touch_points_feature_id_features_id_fk` FOREIGN KEY (`feature_id`) REFERENCES `features`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `corrections` ADD CONSTRAINT `corrections_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `corrections` ADD CONSTRAINT `corrections_run_id_runs_id_fk` FOREIGN KEY (`run_id`) REFERENCES `runs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `corrections` ADD CONSTRAINT `corrections_applied_by_users_id_fk` FOREIGN KEY (`applied_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `measurements` ADD CONSTRAINT `measurements_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `measurements` ADD CONSTRAINT `measurements_run_id_runs_id_fk` FOREIGN KEY (`run_id`) REFERENCES `runs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `results` ADD CONSTRAINT `results_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `results` ADD CONSTRAINT `results_run_id_runs_id_fk` FOREIGN KEY (`run_id`) REFERENCES `runs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `results` ADD CONSTRAINT `results_tolerance_id_tolerances_id_fk` FOREIGN KEY (`tolerance_id`) REFERENCES `tolerances`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `runs` ADD CONSTRAINT `runs_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `runs` ADD CONSTRAINT `runs_revision_id_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `revisions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `runs` ADD CONSTRAINT `runs_uploaded_by_users_id_fk` FOREIGN KEY (`uploaded_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `audit_events` ADD CONSTRAINT `audit_events_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `mail_outbox` ADD CONSTRAINT `mail_outbox_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `api_tokens_user_idx` ON `api_tokens` (`user_id`);--> statement-breakpoint
CREATE INDEX `invitations_workspace_email_idx` ON `invitations` (`workspace_id`,`email`);--> statement-breakpoint
CREATE INDEX `memberships_user_idx` ON `memberships` (`user_id`);--> statement-breakpoint
CREATE INDEX `probe_calibrations_probe_idx` ON `probe_calibrations` (`probe_id`,`occurred_at`);--> statement-breakpoint
CREATE INDEX `tolerances_feature_idx` ON `tolerances` (`feature_id`);--> statement-breakpoint
CREATE INDEX `tolerances_part_idx` ON `tolerances` (`part_id`);--> statement-breakpoint
CREATE INDEX `programs_part_idx` ON `programs` (`part_id`);--> statement-breakpoint
CREATE INDEX `programs_machine_idx` ON `programs` (`machine_id`);--> statement-breakpoint
CREATE INDEX `review_decisions_revision_idx` ON `review_decisions` (`revision_id`);--> statement-breakpoint
CREATE INDEX `revisions_workspace_status_idx` ON `revisions` (`workspace_id`,`status`);--> statement-breakpoint
CREATE INDEX `touch_points_revision_seq_idx` ON `touch_points` (`revision_id`,`seq`);--> statement-breakpoint
CREATE INDEX `corrections_run_idx` ON `corrections` (`run_id`);--> statement-breakpoint
CREATE INDEX `measurements_run_idx` ON `measurements` (`run_id`,`touch_point_uuid`);--> statement-breakpoint
CREATE INDEX `results_run_idx` ON `results` (`run_id`);--> statement-breakpoint
CREATE INDEX `results_tolerance_idx` ON `results` (`tolerance_id`);--> statement-breakpoint
CREATE INDEX `runs_revision_idx` ON `runs` (`revision_id`);--> statement-breakpoint
CREATE INDEX `runs_workspace_created_idx` ON `runs` (`workspace_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `audit_workspace_created_idx` ON `audit_events` (`workspace_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `audit_workspace_action_idx` ON `audit_events` (`workspace_id`,`action`);--> statement-breakpoint
CREATE INDEX `mail_outbox_due_idx` ON `mail_outbox` (`status`,`next_attempt_at`);--> statement-breakpoint
CREATE INDEX `sign_in_attempts_email_idx` ON `sign_in_attempts` (`email`,`created_at`);--> statement-breakpoint
CREATE INDEX `sign_in_attempts_ip_idx` ON `sign_in_attempts` (`ip`,`created_at`);