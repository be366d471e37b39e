-- The last n elements of an array (the "latest 50 answers" windows of the statistics rollups).
create or replace function progress_tail(a anyarray, n integer) returns anyarray language sql immutable as
$fn$ select a[greatest(cardinality(a) - n + 1, 1):cardinality(a)] $fn$;
