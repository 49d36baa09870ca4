// The two PostgreSQL roles of a deployment, as SQL run by a superuser (shared by
// scripts/lib/postgres.mjs and the API tests' global set-up, hence CommonJS).
// - upstroke_owner owns the schema: migrations and seeds run as it.
// - upstroke_app is what the API connects as: no superuser, no ownership, only the table
//   privileges granted after migrating (db/src/grants.ts).

const ownerRole = 'upstroke_owner';
const appRole = 'upstroke_app';

/** Creates both roles when absent and hands `database` and its public objects to the owner. */
function rolesSql(database) {
  const db = `"${database.replace(/"/g, '""')}"`;
  return `
do $$ begin
  if not exists (select from pg_roles where rolname = '${ownerRole}') then
    create role ${ownerRole} login nosuperuser nocreatedb nocreaterole noreplication;
  end if;
  if not exists (select from pg_roles where rolname = '${appRole}') then
    create role ${appRole} login nosuperuser nocreatedb nocreaterole noreplication;
  end if;
end $$;
alter database ${db} owner to ${ownerRole};
alter schema public owner to ${ownerRole};
revoke create on schema public from public;
grant usage on schema public to ${appRole};
grant connect on database ${db} to ${appRole};
-- Objects made before the roles existed (a database first migrated as postgres).
do $$ declare r record; begin
  for r in select c.oid::regclass as name from pg_class c
             join pg_namespace n on n.oid = c.relnamespace
            where n.nspname = 'public' and c.relkind in ('r', 'p', 'v')
              and pg_get_userbyid(c.relowner) <> '${ownerRole}' loop
    execute format('alter table %s owner to ${ownerRole}', r.name);
  end loop;
  for r in select p.oid::regprocedure as name from pg_proc p
             join pg_namespace n on n.oid = p.pronamespace
            where n.nspname = 'public' and pg_get_userbyid(p.proowner) <> '${ownerRole}' loop
    execute format('alter function %s owner to ${ownerRole}', r.name);
  end loop;
end $$;
`;
}

module.exports = { ownerRole, appRole, rolesSql };
