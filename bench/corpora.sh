#!/usr/bin/env bash
# Fetch the real documentation sets that the quality and speed tables are measured on.
# They are written by other people and kept out of this repository.
#
#   bash bench/corpora.sh [DIR]      (default: ../corpora beside the checkout)
#
# Each set lands in DIR/<name>/site, ready for `linkweave <command> DIR/<name>/site`:
#   nodejs-doc    Debian nodejs-doc 18.20.4+dfsg-1~deb12u3: the Node.js API reference, 64 Markdown pages
#   npm-docs      npm package npm@10.9.9: docs/content, the npm CLI's Markdown documentation
#   python-doc    Debian python3.11-doc 3.11.2-6+deb12u9: the Python 3.11 documentation, built HTML
#   postgres-doc  Debian postgresql-doc-15 15.20-0+deb12u1: the PostgreSQL 15 manual, built HTML
# Debian versions are pinned where apt still serves them; otherwise the current one is taken and
# the script says which it got.
set -euo pipefail
DIR="${1:-$(cd "$(dirname "$0")/../.." && pwd)/corpora}"
mkdir -p "$DIR"
cd "$DIR"

deb() { # name version -> extracted into ./<name>-deb
  local name="$1" version="$2"
  if [ ! -d "$name-deb" ]; then
    apt-get download "$name=$version" >/dev/null 2>&1 || { echo "note: $name $version is gone; taking the current one"; apt-get download "$name" >/dev/null; }
    mkdir -p "$name-deb"
    dpkg -x "$name"_*.deb "$name-deb"
  fi
  echo "$name $(dpkg-deb -f "$name"_*.deb Version)"
}

# Node.js API reference: the Markdown sources ship gzipped.
deb nodejs-doc '18.20.4+dfsg-1~deb12u3'
if [ ! -d nodejs-doc/site ]; then
  mkdir -p nodejs-doc/site
  for f in nodejs-doc-deb/usr/share/doc/nodejs/api/*.md nodejs-doc-deb/usr/share/doc/nodejs/api/*.md.gz; do
    [ -e "$f" ] || continue
    base=$(basename "$f" .gz)
    if [[ "$f" == *.gz ]]; then gunzip -c "$f" > "nodejs-doc/site/$base"; else cp "$f" "nodejs-doc/site/$base"; fi
  done
fi

# npm CLI documentation: Markdown under docs/content of the npm package.
if [ ! -d npm-docs/site ]; then
  mkdir -p npm-docs
  (cd npm-docs && npm pack npm@10.9.9 --silent >/dev/null && tar xzf npm-10.9.9.tgz && mkdir -p site && cp -r package/docs/content/. site/)
fi
echo "npm 10.9.9 (docs/content)"

# Python 3.11 documentation, built HTML.
deb python3.11-doc '3.11.2-6+deb12u9'
if [ ! -d python-doc/site ]; then
  mkdir -p python-doc
  cp -r python3.11-doc-deb/usr/share/doc/python3.11/html python-doc/site
fi

# PostgreSQL 15 manual, built HTML.
deb postgresql-doc-15 '15.20-0+deb12u1'
if [ ! -d postgres-doc/site ]; then
  mkdir -p postgres-doc
  cp -r postgresql-doc-15-deb/usr/share/doc/postgresql-doc-15/html postgres-doc/site
fi

for s in nodejs-doc npm-docs python-doc postgres-doc; do
  printf '%-13s %6d files  %s\n' "$s" "$(find "$s/site" -type f \( -name '*.md' -o -name '*.html' \) | wc -l)" "$DIR/$s/site"
done
