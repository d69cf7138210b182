#!/usr/bin/env bash
# The headless commands (sweep, demo, ...): org.foldbook.cli.Main with plain `java -cp` over the plug-in
# folder of the materialised product, so the command line runs with exactly the library versions the
# target platform pins (no second list of jar versions here). Builds the product when it is missing or
# older than a source file of a Foldbook bundle.
# Heap: FOLDBOOK_HEAP (e.g. 6g) sets -Xmx; by default it is sized from an --input file (the channel in
# memory, plus one filtered copy in the modelled mode); --stream needs little.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
source "$here/releng/scripts/find-jdk.sh"
product="$here/releng/org.foldbook.product/target/products/org.foldbook.product/linux/gtk/x86_64"
repo="${MAVEN_REPO:-$HOME/.m2/repository}"

cli_jar() { ls "$product"/plugins/org.foldbook.cli_*.jar 2>/dev/null | head -n 1; }
jar="$(cli_jar)"
if [ -z "$jar" ] || [ -n "$(find "$here"/bundles/*/src "$here"/bundles/*/META-INF -newer "$jar" -type f 2>/dev/null | head -n 1)" ]; then
    echo "foldbook: building the product (its jars are missing or older than the sources) ..." >&2
    offline=""
    [ -d "$repo/org/eclipse/tycho/tycho-maven-plugin/5.0.2" ] && offline="-o"
    (cd "$here" && ./mvnw -B -q $offline verify -DskipTests) >&2
    jar="$(cli_jar)"
    [ -n "$jar" ] || { echo "foldbook: no org.foldbook.cli jar in $product/plugins after the build" >&2; exit 3; }
fi

heap="${FOLDBOOK_HEAP:-${FOLDBOOK_SWEEP_HEAP:-}}"
if [ -z "$heap" ]; then
    input=""
    prev=""
    for a in "$@"; do
        [ "$prev" = "--input" ] && input="$a"
        prev="$a"
    done
    mb=1024
    if [ -n "$input" ] && [ -f "$input" ]; then
        size=$(stat -c %s "$input")
        # worst case 16-bit samples: 4 bytes in, 8 bytes per double; two arrays (modelled mode)
        mb=$(( 1024 + size * 8 / 1048576 ))
    fi
    cap=$(( $(awk '/MemTotal/ {print $2}' /proc/meminfo) * 3 / 4 / 1024 ))
    [ "$mb" -gt "$cap" ] && mb="$cap"
    heap="${mb}m"
fi
exec "$FOLDBOOK_JAVA" -Xmx"$heap" -Djava.awt.headless=true -cp "$product/plugins/*" org.foldbook.cli.Main "$@"
