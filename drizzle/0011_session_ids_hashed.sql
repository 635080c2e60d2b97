-- Written by hand (drizzle-kit generate --custom): session ids are now the SHA-256 of the
-- cookie's token (docs/decisions/015), so the rows made before hold cookie values in clear
-- text that no cookie can reach any more. Removing them signs everyone out once.
DELETE FROM `sessions`;
