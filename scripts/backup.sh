#!/usr/bin/env bash
# `npm run db:backup` / `npm run db:restore [-- FILE]`: PostgreSQL's own pg_dump and pg_restore (custom format).
# The database is the one `npm start` runs, or DATABASE_URL when it is set; files go to backups/ (BACKUP_DIR).
source "$(dirname "$0")/lib.sh"
cd "$ROOT"

command=${1:-}
BACKUP_DIR=${BACKUP_DIR:-$ROOT/backups}
BIN=$(pg_bindir)
STARTED=""

finish() {
  local rc=$?
  # A cluster this script started for itself is stopped again.
  if [ -n "$STARTED" ]; then stop_postgres; fi
  exit $rc
}
trap finish EXIT

if [ -z "${DATABASE_URL:-}" ]; then
  PG_PORT=${FELTWIRE_PG_PORT:-55432}
  DB_NAME=${FELTWIRE_DB:-feltwire}
  if ! (exec 3<>"/dev/tcp/127.0.0.1/$PG_PORT") 2>/dev/null; then
    if [ ! -f "$(pg_datadir dev)/db/PG_VERSION" ]; then
      log "there is no local database yet: run npm start once, or set DATABASE_URL"
      exit 1
    fi
    start_postgres dev "$PG_PORT"
    STARTED=1
  fi
  DATABASE_URL="postgres://postgres@127.0.0.1:$PG_PORT/$DB_NAME"
fi
# The address without its password, for messages.
SHOWN=$(printf '%s' "$DATABASE_URL" | sed -E 's#(://[^:/@]+):[^@]*@#\1:***@#')

case "$command" in
  backup)
    mkdir -p "$BACKUP_DIR"
    name=$(basename "${DATABASE_URL%%\?*}")
    file="$BACKUP_DIR/$name-$(date -u +%Y%m%d-%H%M%S).dump"
    "$BIN/pg_dump" --format=custom --no-owner --file "$file" --dbname "$DATABASE_URL" || { rm -f "$file"; log "the backup of $SHOWN failed (see above)"; exit 1; }
    log "backed up $SHOWN to ${file#"$ROOT"/} ($(du -h "$file" | cut -f1))"
    log "restore it with: npm run db:restore -- ${file#"$ROOT"/}"
    ;;
  restore)
    file=${2:-}
    if [ -z "$file" ]; then
      file=$(ls -t "$BACKUP_DIR"/*.dump 2>/dev/null | head -n 1 || true)
      [ -n "$file" ] || { log "no backup in ${BACKUP_DIR#"$ROOT"/}/: make one with npm run db:backup, or name a file"; exit 1; }
      log "taking the newest backup, ${file#"$ROOT"/}"
    fi
    [ -f "$file" ] || { log "no such backup file: $file"; exit 1; }
    "$BIN/pg_restore" --list "$file" >/dev/null 2>&1 || { log "$file is not a pg_dump custom-format backup"; exit 1; }
    if [ -t 0 ]; then
      read -r -p "Replace everything in $SHOWN with $file? Stop npm start first. [y/N] " answer
      case "$answer" in y|Y|yes) ;; *) log "nothing restored"; exit 1 ;; esac
    fi
    # One transaction: the database is replaced whole, or left as it was.
    "$BIN/pg_restore" --clean --if-exists --no-owner --single-transaction --exit-on-error --dbname "$DATABASE_URL" "$file" || { log "the restore failed and changed nothing (see above)"; exit 1; }
    log "restored $SHOWN from ${file#"$ROOT"/}"
    ;;
  *)
    echo "usage: bash scripts/backup.sh backup | restore [FILE]" >&2
    exit 2
    ;;
esac
