#!/usr/bin/env bash
# Run a command against a throwaway PostgreSQL cluster: `bash tests/support/with-postgres.sh CMD…`.
# Installs Debian's postgresql package when its binaries are missing (needs root, as CI has), makes
# a cluster in a temporary folder on a free port (initdb and pg_ctl as the `postgres` user when run
# as root, which initdb refuses, else as the current user), exports DATABASE_URL for a database
# `spanwright` in it, runs CMD, and always stops and removes the cluster. The cluster is for tests:
# C locale (sorting as SQLite does), no fsync.
set -euo pipefail

pgbin() { ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -1; }
PGBIN="${PGBIN:-$(pgbin)}"
if [ -z "$PGBIN" ] || [ ! -x "$PGBIN/initdb" ]; then
	echo "Installing PostgreSQL from Debian's packages…"
	SUDO=""; [ "$(id -u)" -ne 0 ] && SUDO="sudo"
	$SUDO apt-get update -qq
	DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq postgresql >/dev/null
	PGBIN="$(pgbin)"
fi

dir="$(mktemp -d "${TMPDIR:-/tmp}/spanwright-pg.XXXXXX")"
port="$(node -e 'const s=require("net").createServer();s.listen(0,"127.0.0.1",()=>{console.log(s.address().port);s.close()})')"
if [ "$(id -u)" -eq 0 ]; then
	chown postgres: "$dir"
	as_owner() { runuser -u postgres -- "$@"; }
else
	as_owner() { "$@"; }
fi

stop() {
	as_owner "$PGBIN/pg_ctl" -D "$dir/data" -m immediate stop >/dev/null 2>&1 || true
	rm -rf "$dir"
}
trap stop EXIT

as_owner "$PGBIN/initdb" -D "$dir/data" -U spanwright --auth=trust --locale=C --encoding=UTF8 \
	--no-sync >/dev/null
as_owner "$PGBIN/pg_ctl" -D "$dir/data" -l "$dir/server.log" -w -s \
	-o "-p $port -k $dir -c listen_addresses=127.0.0.1 -c fsync=off -c synchronous_commit=off -c full_page_writes=off -c max_connections=200" \
	start || { cat "$dir/server.log"; exit 1; }
as_owner "$PGBIN/createdb" -h 127.0.0.1 -p "$port" -U spanwright spanwright

export DATABASE_URL="postgres://spanwright@127.0.0.1:$port/spanwright"
echo "PostgreSQL $("$PGBIN/postgres" --version | awk '{print $3}') on port $port (cluster in $dir)"
status=0
"$@" || status=$?
exit $status
