#!/usr/bin/env bash
# Builds Baywright's self-contained application image (a Java runtime inside, started by name) and,
# on Linux with dpkg-deb, a .deb package, from the shaded jar. Run by `mvn -Prelease verify`
# (see DEVELOPERS.md, "Releases"); arguments: JDK_HOME VERSION PROJECT_DIR.
set -euo pipefail
jdk=$1; version=$2; project=$3
cd "$project"
jar=target/baywright.jar
[ -f "$jar" ] || { echo "release: $jar is missing; the package phase builds it" >&2; exit 1; }
in=target/package-input; out=target/release
rm -rf "$in" "$out"; mkdir -p "$in" "$out"
cp "$jar" "$in/"
common=(--name baywright --app-version "$version" --input "$in" --main-jar baywright.jar
        --main-class org.baywright.Launcher --dest "$out"
        --vendor "Baywright" --copyright "Baywright contributors, Apache License 2.0"
        --description "Steel floor framing: tributary areas, load takedown and lightest-section design. A preliminary design aid: results must be checked by a licensed engineer."
        --java-options "-Dfile.encoding=UTF-8" --icon src/package/linux/baywright.png)
echo "release: app image"
"$jdk/bin/jpackage" --type app-image "${common[@]}"
if [ "$(uname -s)" = Linux ] && command -v dpkg-deb >/dev/null && command -v fakeroot >/dev/null; then
  echo "release: Linux package (.deb)"
  "$jdk/bin/jpackage" --type deb "${common[@]}" --linux-package-name baywright --linux-app-category science \
      --linux-shortcut --license-file LICENSE --resource-dir src/package/linux
else
  echo "release: no .deb here (needs Linux with dpkg-deb and fakeroot); the app image is built"
fi
ls -l "$out"
