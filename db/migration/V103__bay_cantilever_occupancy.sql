-- The occupancy of a bay's cantilever slabs, a catalogue id. NULL (every existing row) means the default:
-- the balcony or deck serving the bay's occupancy (docs/engine.md). 80 characters: a derived balcony id is
-- "balcony:" and a firm id of up to 60. Runs unchanged on H2 2.5 and PostgreSQL 15.
ALTER TABLE bay ADD COLUMN cantilever_occupancy VARCHAR(80);
