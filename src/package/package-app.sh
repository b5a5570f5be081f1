#!/usr/bin/env bash
# Builds the desktop app from target/proofrun.jar (run by `mvn -B -Papp package`, after the shaded jar):
#
#   target/runtime/                     a Java runtime cut to the modules the jar needs, JavaFX's among them
#                                       (jlink), with its own default class-data-sharing archive (-Xshare:dump)
#   target/jpackage/proofrun/           the app image (jpackage --type app-image): bin/proofrun starts the wizard
#   target/jpackage/proofrun/lib/app/proofrun.jsa
#                                       the app's class-data-sharing archive, recorded in one training run
#   target/jpackage/proofrun_*.deb      a Debian package of the same image (installs to /opt/proofrun), where
#                                       dpkg-deb is present
#   target/proofrun.jsa                 an archive for `java -XX:SharedArchiveFile=target/proofrun.jsa -jar target/proofrun.jar`
#
# The training runs open the window, so they need a display: the script uses $DISPLAY if set, else xvfb-run.
# Without either it still builds the image and the package, only without the archives (it says so).
set -euo pipefail
cd "$(dirname "$0")/../.."

jar="$(pwd)/target/proofrun.jar"
name=proofrun
main=dev.proofrun.Main
version="$(sed -n 's/^version=//p' target/classes/proofrun-version.properties 2>/dev/null | head -1)"
# jpackage wants a version of plain numbers
app_version="$(printf '%s' "${version:-0.1.0}" | sed 's/[^0-9.].*//; s/\.$//')"
[ -n "$app_version" ] || app_version=0.1.0

for tool in jdeps jlink jpackage; do
  command -v "$tool" >/dev/null || { echo "package-app: $tool not found (a full JDK 17 is needed)" >&2; exit 2; }
done
command -v zip >/dev/null || { echo "package-app: zip not found (apt-get install zip)" >&2; exit 2; }
[ -f "$jar" ] || { echo "package-app: $jar is missing; run mvn package first" >&2; exit 2; }

# a command that can open a window: the display at hand, else a virtual one
display_run() {
  if [ -n "${DISPLAY:-}" ]; then
    "$@"
  elif command -v xvfb-run >/dev/null; then
    xvfb-run -a "$@"
  else
    return 127
  fi
}

# one training run: the wizard shows each step once (dev.proofrun.app.TrainingRun) and closes; the JVM writes
# the classes it loaded to the archive as it exits
train() {
  local java="$1" archive classpath="$3" home
  archive="$(cd "$(dirname "$2")" && pwd)/$(basename "$2")"
  home="$(mktemp -d)"
  rm -f "$archive"
  # run in the temporary home, so that the wizard's default plans folder (./plans) is not the project's
  if (cd "$home" && display_run "$java" -XX:ArchiveClassesAtExit="$archive" -Dproofrun.home="$home" \
      -cp "$classpath" dev.proofrun.app.TrainingRun) >target/training.log 2>&1 && [ -s "$archive" ]; then
    echo "package-app: recorded $archive ($(du -h "$archive" | cut -f1)); $(grep 'training run:' target/training.log)"
  else
    rm -f "$archive"
    echo "package-app: no display (set DISPLAY or install xvfb); $archive not recorded, see target/training.log" >&2
  fi
  rm -rf "$home"
}

echo "package-app: runtime image"
# the base classes of the multi-release jar: the shaded jar keeps some libraries' versioned module-info files,
# which would make jdeps read the whole jar as one of those modules
modules="$(jdeps --ignore-missing-deps --multi-release base --print-module-deps "$jar")"
# found by use, not by jdeps: zip file systems, every text encoding, and the locale data `java -jar` has
modules="$modules,jdk.unsupported,jdk.zipfs,jdk.charsets,jdk.localedata"
# JavaFX goes into the runtime as the modules it is made as (the platform jars that the build copies to
# target/javafx), so the app runs it from named modules: no "Unsupported JavaFX configuration" warning. The
# jar's own copies of JavaFX's packages are then never read (a package in a named module wins).
ls target/javafx/javafx-graphics-*-*.jar >/dev/null 2>&1 \
  || { echo "package-app: target/javafx holds no JavaFX platform jars; run mvn package first" >&2; exit 2; }
modules="$modules,javafx.controls,javafx.swing"
rm -rf target/runtime target/jpackage target/app-input
jlink --module-path target/javafx --add-modules "$modules" --strip-debug --no-header-files --no-man-pages \
  --compress=2 --output target/runtime
# the runtime's own default archive: the JDK's classes, and the base that the app's archive builds on
target/runtime/bin/java -Xshare:dump >/dev/null

echo "package-app: app image"
mkdir -p target/app-input
cp "$jar" target/app-input/
# the runtime carries JavaFX, so the app's copy of the jar leaves out JavaFX's packages and native libraries
# (a package in a named module wins anyway; this only saves the second copy)
fx_entries=(lib*.so javafx.properties javafx-swt.jar)
for m in javafx.base javafx.graphics javafx.controls javafx.swing; do
  while read -r package; do fx_entries+=("${package//./\/}/*"); done \
    < <(target/runtime/bin/java --describe-module "$m" | awk '$1 == "qualified" { print $3; next } $1 == "exports" || $1 == "opens" || $1 == "contains" { print $2 }' | sort -u)
done
zip -q -ws -d "target/app-input/$(basename "$jar")" "${fx_entries[@]}"
jpackage --type app-image --name "$name" --app-version "$app_version" --dest target/jpackage \
  --input target/app-input --main-jar "$(basename "$jar")" --main-class "$main" \
  --runtime-image target/runtime \
  --java-options '-XX:SharedArchiveFile=$APPDIR/proofrun.jsa' --java-options '-Xshare:auto'
image="$(pwd)/target/jpackage/$name"
train "$image/lib/runtime/bin/java" "$image/lib/app/proofrun.jsa" "$image/lib/app/$(basename "$jar")"

echo "package-app: archive for java -jar"
train java target/proofrun.jsa "$jar"

# The package installs the image to /opt/proofrun. JDK 17 accepts an archive only where the jar lies at the path,
# and with the modification time, it was recorded with; jpackage gives the packaged files new times. So the
# package is built without an archive, unpacked, its /opt/proofrun trained in place (only if nothing is there
# yet, and removed after), and packed again with the archive; otherwise it starts without one.
add_archive_to_deb() {
  local deb="$1" root=target/deb-root installed=/opt/$name
  if [ ! -w /opt ] || [ -e "$installed" ]; then
    echo "package-app: $installed exists or /opt is not writable; the .deb has no class-data-sharing archive" >&2
    return
  fi
  rm -rf "$root" && dpkg-deb -R "$deb" "$root"
  cp -a "$root/opt/$name" "$installed"
  train "$installed/lib/runtime/bin/java" "$installed/lib/app/proofrun.jsa" "$installed/lib/app/$(basename "$jar")"
  if [ -f "$installed/lib/app/proofrun.jsa" ]; then
    cp -a "$installed/lib/app/proofrun.jsa" "$root/opt/$name/lib/app/"
    sed -i "s/^Installed-Size: .*/Installed-Size: $(du -sk "$root/opt" | cut -f1)/" "$root/DEBIAN/control"
    fakeroot dpkg-deb -b "$root" "$deb" >/dev/null
  fi
  rm -rf "$installed" "$root"
}

if command -v dpkg-deb >/dev/null && command -v fakeroot >/dev/null; then
  echo "package-app: Debian package"
  rm -rf target/deb-image && mkdir -p target/deb-image && cp -a "$image" "target/deb-image/$name"
  rm -f "target/deb-image/$name/lib/app/proofrun.jsa"
  jpackage --type deb --app-image "target/deb-image/$name" --name "$name" --app-version "$app_version" \
    --dest target/jpackage --linux-shortcut --linux-menu-group Science
  deb="$(ls target/jpackage/${name}_*.deb)"
  add_archive_to_deb "$deb"
  echo "package-app: $deb"
else
  echo "package-app: dpkg-deb or fakeroot missing; no .deb"
fi
