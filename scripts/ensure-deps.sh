# Sourced: installs the npm dependencies when node_modules is missing or older than the lock file.
if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "Installing npm dependencies…"
  npm ci --no-audit --no-fund --loglevel=error
fi
