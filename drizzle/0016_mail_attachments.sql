CREATE TABLE `mail_attachments` (
	`id` int AUTO_INCREMENT NOT NULL,
	`outbox_id` int NOT NULL,
	`file_name` varchar(200) NOT NULL,
	`content_type` varchar(100) NOT NULL,
	`content_base64` longtext NOT NULL,
	`byte_size` int NOT NULL,
	CONSTRAINT `mail_attachments_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `mail_attachments` ADD CONSTRAINT `mail_attachments_outbox_id_mail_outbox_id_fk` FOREIGN KEY (`outbox_id`) REFERENCES `mail_outbox`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `mail_attachments_outbox_idx` ON `mail_attachments` (`outbox_id`);