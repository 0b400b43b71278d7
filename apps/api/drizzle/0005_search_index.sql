-- Full-text indexes for the jobs, bikes and customers searches (rowid = the row's id).
-- Kept in step by triggers, so every writer stays correct without knowing about them.
CREATE VIRTUAL TABLE job_search USING fts5(body, tokenize = 'unicode61 remove_diacritics 2', prefix = '2 3');
--> statement-breakpoint
CREATE VIRTUAL TABLE bike_search USING fts5(body, tokenize = 'unicode61 remove_diacritics 2', prefix = '2 3');
--> statement-breakpoint
CREATE VIRTUAL TABLE customer_search USING fts5(body, tokenize = 'unicode61 remove_diacritics 2', prefix = '2 3');
--> statement-breakpoint
INSERT INTO job_search(rowid, body) SELECT j.id, j.number || ' ' || c.name || ' ' || c.email || ' ' || c.phone || ' ' || b.maker || ' ' || b.model || ' ' || b.serial_number FROM jobs j JOIN customers c ON c.id = j.customer_id JOIN bikes b ON b.id = j.bike_id WHERE 1 = 1;
--> statement-breakpoint
INSERT INTO bike_search(rowid, body) SELECT b.id, b.maker || ' ' || b.model || ' ' || b.serial_number || ' ' || c.name FROM bikes b JOIN customers c ON c.id = b.customer_id WHERE 1 = 1;
--> statement-breakpoint
INSERT INTO customer_search(rowid, body) SELECT c.id, c.name || ' ' || c.email || ' ' || c.phone FROM customers c WHERE 1 = 1;
--> statement-breakpoint
CREATE TRIGGER job_search_ai AFTER INSERT ON jobs BEGIN INSERT INTO job_search(rowid, body) SELECT j.id, j.number || ' ' || c.name || ' ' || c.email || ' ' || c.phone || ' ' || b.maker || ' ' || b.model || ' ' || b.serial_number FROM jobs j JOIN customers c ON c.id = j.customer_id JOIN bikes b ON b.id = j.bike_id WHERE j.id = new.id; END;
--> statement-breakpoint
CREATE TRIGGER job_search_au AFTER UPDATE OF number, customer_id, bike_id ON jobs BEGIN DELETE FROM job_search WHERE rowid = old.id; INSERT INTO job_search(rowid, body) SELECT j.id, j.number || ' ' || c.name || ' ' || c.email || ' ' || c.phone || ' ' || b.maker || ' ' || b.model || ' ' || b.serial_number FROM jobs j JOIN customers c ON c.id = j.customer_id JOIN bikes b ON b.id = j.bike_id WHERE j.id = new.id; END;
--> statement-breakpoint
CREATE TRIGGER job_search_ad AFTER DELETE ON jobs BEGIN DELETE FROM job_search WHERE rowid = old.id; END;
--> statement-breakpoint
CREATE TRIGGER customer_search_ai AFTER INSERT ON customers BEGIN INSERT INTO customer_search(rowid, body) SELECT c.id, c.name || ' ' || c.email || ' ' || c.phone FROM customers c WHERE c.id = new.id; END;
--> statement-breakpoint
CREATE TRIGGER customer_search_au AFTER UPDATE OF name, email, phone ON customers BEGIN DELETE FROM customer_search WHERE rowid = old.id; INSERT INTO customer_search(rowid, body) SELECT c.id, c.name || ' ' || c.email || ' ' || c.phone FROM customers c WHERE c.id = new.id; DELETE FROM job_search WHERE rowid IN (SELECT id FROM jobs WHERE customer_id = new.id); INSERT INTO job_search(rowid, body) SELECT j.id, j.number || ' ' || c.name || ' ' || c.email || ' ' || c.phone || ' ' || b.maker || ' ' || b.model || ' ' || b.serial_number FROM jobs j JOIN customers c ON c.id = j.customer_id JOIN bikes b ON b.id = j.bike_id WHERE j.customer_id = new.id; DELETE FROM bike_search WHERE rowid IN (SELECT id FROM bikes WHERE customer_id = new.id); INSERT INTO bike_search(rowid, body) SELECT b.id, b.maker || ' ' || b.model || ' ' || b.serial_number || ' ' || c.name FROM bikes b JOIN customers c ON c.id = b.customer_id WHERE b.customer_id = new.id; END;
--> statement-breakpoint
CREATE TRIGGER customer_search_ad AFTER DELETE ON customers BEGIN DELETE FROM customer_search WHERE rowid = old.id; END;
--> statement-breakpoint
CREATE TRIGGER bike_search_ai AFTER INSERT ON bikes BEGIN INSERT INTO bike_search(rowid, body) SELECT b.id, b.maker || ' ' || b.model || ' ' || b.serial_number || ' ' || c.name FROM bikes b JOIN customers c ON c.id = b.customer_id WHERE b.id = new.id; END;
--> statement-breakpoint
CREATE TRIGGER bike_search_au AFTER UPDATE OF maker, model, serial_number, customer_id ON bikes BEGIN DELETE FROM bike_search WHERE rowid = old.id; INSERT INTO bike_search(rowid, body) SELECT b.id, b.maker || ' ' || b.model || ' ' || b.serial_number || ' ' || c.name FROM bikes b JOIN customers c ON c.id = b.customer_id WHERE b.id = new.id; DELETE FROM job_search WHERE rowid IN (SELECT id FROM jobs WHERE bike_id = new.id); INSERT INTO job_search(rowid, body) SELECT j.id, j.number || ' ' || c.name || ' ' || c.email || ' ' || c.phone || ' ' || b.maker || ' ' || b.model || ' ' || b.serial_number FROM jobs j JOIN customers c ON c.id = j.customer_id JOIN bikes b ON b.id = j.bike_id WHERE j.bike_id = new.id; END;
--> statement-breakpoint
CREATE TRIGGER bike_search_ad AFTER DELETE ON bikes BEGIN DELETE FROM bike_search WHERE rowid = old.id; END;
