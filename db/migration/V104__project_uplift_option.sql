-- Minimum reactions of overhanging beams: a project may also take them from 0.9D + 1.6L, a conservative
-- practice of some firms and no combination of the code. Off for every existing project.
ALTER TABLE project ADD COLUMN uplift_reduced_dead BOOLEAN DEFAULT FALSE NOT NULL;
