-- Which way each valve acts and where it fails: the motion rules judge runaways against these.
-- valve_action: increase_opens | increase_closes; fail_position: open | closed | in_place.
ALTER TABLE asset ADD COLUMN valve_action VARCHAR(20);
ALTER TABLE asset ADD COLUMN fail_position VARCHAR(10);
ALTER TABLE asset ADD COLUMN return_spring BOOLEAN;
