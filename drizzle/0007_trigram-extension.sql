-- Trigram indexes (pg_trgm) let "contains" searches (LIKE '%00836%') use an index: a technician
-- reads the tail of a serial, a recall names part of a batch code.
create extension if not exists pg_trgm;
