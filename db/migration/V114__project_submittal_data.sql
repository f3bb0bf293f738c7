-- What a building department reads on the cover and the title block of a submittal: the engineer of record,
-- the licence (number and the state or province that issued it) and the building code as the jurisdiction
-- adopted it (its name and edition year). Blank for every existing project until someone enters them.
ALTER TABLE project ADD COLUMN engineer_of_record VARCHAR(200) DEFAULT '' NOT NULL;
ALTER TABLE project ADD COLUMN licence_number VARCHAR(40) DEFAULT '' NOT NULL;
ALTER TABLE project ADD COLUMN licence_state VARCHAR(40) DEFAULT '' NOT NULL;
ALTER TABLE project ADD COLUMN building_code VARCHAR(80) DEFAULT '' NOT NULL;
ALTER TABLE project ADD COLUMN code_year VARCHAR(4) DEFAULT '' NOT NULL;
