#!/usr/bin/env bash
# Fetch the real documentation sets that the quality and speed tables are measured on.
# They are written by other people and kept out of this repository.
#
#   bash bench/corpora.sh [DIR]      (default: ../corpora beside the checkout)
#
# Each set lands in DIR/<name>/site, ready for `linkweave <command> DIR/<name>/site`:
#   nodejs-doc    Debian nodejs-doc 18.20.4+dfsg-1~deb12u2: the Node.js API reference, 64 Markdown pages
#   npm-docs      npm package npm@10.9.9: docs/content, the npm CLI's Markdown documentation
#   python-doc    Debian python3.11-doc 3.11.2-6+deb12u8: the Python 3.11 documentation, built HTML
#   postgres-doc  Debian postgresql-doc-15 15.18-0+deb12u1: the PostgreSQL 15 manual, built HTML
# Generator source trees (each lands in DIR/<name>/site with the generator's config at its root,
# for a run with no linkweave config): Debian source packages, fetched with a private apt source
# list (deb-src) so the machine's apt setup is left alone:
#   nix-manual    Debian source nix 2.8.0-1.1: doc/manual, an mdBook (book.toml, src/SUMMARY.md.in)
#   nlopt-docs    Debian source nlopt 2.7.1-5: mkdocs.yml and doc/docs, a MkDocs site
#   hugo-docs     Debian source hugo 0.111.3-1: docs/, Hugo's own documentation site
# and npm packages that ship a generator's site sources:
#   jekyll-docs   npm package jekyll@3.0.0-beta1 (from the jekyll/jekyll repository): site/, Jekyll's
#                 own documentation site of that time (_config.yml, a docs collection, _posts)
#   docusaurus-classic  npm package create-docusaurus@3.10.2: the classic template as
#                 `create-docusaurus` lays it out (templates/shared, then templates/classic over it)
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
deb nodejs-doc '18.20.4+dfsg-1~deb12u2'
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
deb python3.11-doc '3.11.2-6+deb12u8'
if [ ! -d python-doc/site ]; then
  mkdir -p python-doc
  cp -r python3.11-doc-deb/usr/share/doc/python3.11/html python-doc/site
fi
# Debian compresses changelog files: whatsnew/changelog.html ships as changelog.html.gz, and
# 1,449 links of the site point at it. Unpacked (also in a set fetched before this step), the
# site is as Sphinx built it.
find python-doc/site -name '*.html.gz' -exec gunzip -f {} +

# PostgreSQL 15 manual, built HTML.
deb postgresql-doc-15 '15.18-0+deb12u1'
if [ ! -d postgres-doc/site ]; then
  mkdir -p postgres-doc
  cp -r postgresql-doc-15-deb/usr/share/doc/postgresql-doc-15/html postgres-doc/site
fi

# Debian source packages: a private deb-src list under ./apt, `apt-get source --download-only`.
APT_OPTS=(-o APT::Sandbox::User=root -o Dir::Etc::SourceList="$DIR/apt/src.sources" -o Dir::Etc::SourceParts=/nonexistent
  -o Dir::State::Lists="$DIR/apt/lists" -o Dir::Cache="$DIR/apt/cache")
debsrc() { # name version -> ./src/<name>_<upstream>.orig.tar.*
  local name="$1" version="$2"
  if ! ls "src/${name}_"*.orig.tar.* >/dev/null 2>&1; then
    if [ ! -f apt/src.sources ]; then
      mkdir -p apt/lists/partial apt/cache/archives/partial
      printf 'Types: deb-src\nURIs: http://deb.debian.org/debian\nSuites: bookworm\nComponents: main\nSigned-By: /usr/share/keyrings/debian-archive-keyring.gpg\n' > apt/src.sources
      apt-get "${APT_OPTS[@]}" update >/dev/null
    fi
    mkdir -p src
    (cd src && apt-get "${APT_OPTS[@]}" source --download-only "$name=$version" >/dev/null)
  fi
  echo "$name $version (source)"
}

debsrc nix '2.8.0-1.1'
if [ ! -d nix-manual/site ]; then
  mkdir -p nix-manual && tar xJf src/nix_2.8.0.orig.tar.xz -C nix-manual nix-2.8.0/doc/manual
  mv nix-manual/nix-2.8.0/doc/manual nix-manual/site && rm -rf nix-manual/nix-2.8.0
fi

debsrc nlopt '2.7.1-5'
if [ ! -d nlopt-docs/site ]; then
  mkdir -p nlopt-docs/site && tar xzf src/nlopt_2.7.1.orig.tar.gz -C nlopt-docs/site --strip-components=1 nlopt-2.7.1/mkdocs.yml nlopt-2.7.1/doc/docs
fi

debsrc hugo '0.111.3-1'
if [ ! -d hugo-docs/site ]; then
  mkdir -p hugo-docs/site && tar xzf src/hugo_0.111.3.orig.tar.gz -C hugo-docs/site --strip-components=2 hugo-0.111.3/docs
fi

# Jekyll's own documentation site, as published with jekyll 3.0.0-beta1.
if [ ! -d jekyll-docs/site ]; then
  mkdir -p jekyll-docs
  (cd jekyll-docs && npm pack jekyll@3.0.0-beta1 --silent >/dev/null && tar xzf jekyll-3.0.0-beta1.tgz && cp -r package/site site)
fi
echo "jekyll 3.0.0-beta1 (site/)"

# The Docusaurus classic template, laid out as create-docusaurus does (shared, then classic over it).
if [ ! -d docusaurus-classic/site ]; then
  mkdir -p docusaurus-classic
  (cd docusaurus-classic && npm pack create-docusaurus@3.10.2 --silent >/dev/null && tar xzf create-docusaurus-3.10.2.tgz \
    && mkdir -p site && cp -r package/templates/shared/. site/ && cp -r package/templates/classic/. site/)
fi
echo "create-docusaurus 3.10.2 (templates/classic)"

for s in nodejs-doc npm-docs python-doc postgres-doc nix-manual nlopt-docs hugo-docs jekyll-docs docusaurus-classic; do
  printf '%-13s %6d files  %s\n' "$s" "$(find "$s/site" -type f \( -name '*.md' -o -name '*.mdx' -o -name '*.html' \) | wc -l)" "$DIR/$s/site"
done
