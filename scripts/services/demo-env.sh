# Where the demo keeps its data and which ports it uses; each can be overridden from the environment.
DATA_DIR="${TEARLINE_DATA_DIR:-$ROOT/.data}"
APP_PORT="${APP_PORT:-3000}" PG_PORT="${PG_PORT:-54329}" S3_PORT="${S3_PORT:-4569}"
SMTP_PORT="${SMTP_PORT:-2525}" MAIL_HTTP_PORT="${MAIL_HTTP_PORT:-8025}"
PG_USER=tearline PG_PASSWORD="${PG_PASSWORD:-tearline-local}" PG_DB="${PG_DB:-tearline}" PG_PURPOSE="${PG_PURPOSE:-demo}"
