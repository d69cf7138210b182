#!/usr/bin/env bash
# The headless commands (sweep, demo, ...): org.foldbook.cli.Main with plain `java -cp` over the plug-in
# folder of the materialised product, so the command line runs with exactly the library versions the
# target platform pins (no second list of jar versions here). Builds the product when it is missing or
# older than a source file of a Foldbook bundle.
# Heap: FOLDBOOK_HEAP (e.g. 6g) sets -Xmx; by default it is sized from an --input file (the channel in
# memory, plus one filtered copy in the modelled mode); with --stream 256 MB.
# Quick start: an ahead-of-time cache of the classes the command loads and links and of the method
# profiles of a training run (JDK 25: -XX:AOTCacheOutput writes it after the first run, in the background, -XX:AOTCache uses
# it; older JDKs: a dynamic class-data-sharing archive), kept per JDK and product under ~/.cache/foldbook
# and rebuilt when a plug-in jar is newer. FOLDBOOK_AOT=0 turns it off.
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

input=""
prev=""
for a in "$@"; do
    [ "$prev" = "--input" ] && input="$a"
    prev="$a"
done
heap="${FOLDBOOK_HEAP:-${FOLDBOOK_SWEEP_HEAP:-}}"
if [ -z "$heap" ]; then
    mb=1024
    stream=0
    for a in "$@"; do [ "$a" = "--stream" ] && stream=1; done
    if [ "$stream" = 1 ]; then
        mb=256   # blocks x rates, not the recording: about 0.5 MB a rate
    elif [ -n "$input" ] && [ -f "$input" ]; then
        size=$(stat -c %s "$input")
        # worst case 16-bit samples: 4 bytes in, 8 bytes per double; two arrays (modelled mode)
        mb=$(( 1024 + size * 8 / 1048576 ))
    fi
    cap=$(( $(awk '/MemTotal/ {print $2}' /proc/meminfo) * 3 / 4 / 1024 ))
    [ "$mb" -gt "$cap" ] && mb="$cap"
    heap="${mb}m"
fi
# The FFT's Vector API kernel (dsp.fft.FftKernels) needs --add-modules jdk.incubator.vector. It is about twice
# JTransforms' speed once compiled, but until the JIT has compiled it (a few hundred transforms) it runs far
# slower and costs about 0.5 CPU-seconds of warm-up (benchmarks README): it pays from about 10^5 transforms, so
# it is used for large inputs (>= 64 MiB, i.e. 8.4e6 float64 samples) and streamed sweeps; FOLDBOOK_FFT_VECTOR=1
# or 0 decides instead. The two kernels agree to about 1e-15 of the largest bin; a given command line always
# picks the same one.
vector="${FOLDBOOK_FFT_VECTOR:-}"
if [ -z "$vector" ]; then
    vector=0
    for a in "$@"; do [ "$a" = "--stream" ] && vector=1; done
    [ -n "${input:-}" ] && [ -f "$input" ] && [ "$(stat -c %s "$input")" -ge $((64 * 1048576)) ] && vector=1
fi
java_args=(-Xmx"$heap" -Djava.awt.headless=true)
[ "$vector" = 1 ] && java_args+=(--add-modules jdk.incubator.vector)
java_args+=(-cp "$product/plugins/*")
cache_dir="${XDG_CACHE_HOME:-$HOME/.cache}/foldbook"
if [ "${FOLDBOOK_AOT:-1}" != 0 ] && mkdir -p "$cache_dir" 2>/dev/null && [ -w "$cache_dir" ]; then
    key=$(printf '%s\n%s\n%s\n' "$FOLDBOOK_JAVA_HOME" "$product" "$vector" | sha256sum | cut -c1-16)
    if [ "$(foldbook_java_major "$FOLDBOOK_JAVA_HOME")" -ge 25 ] 2>/dev/null; then
        cache="$cache_dir/cli-$key.aot"
        if [ -f "$cache" ] && [ -n "$(find "$product/plugins" -newer "$cache" -name '*.jar' 2>/dev/null | head -n 1)" ]; then
            rm -f "$cache"
        fi
        if [ -f "$cache" ]; then
            exec "$FOLDBOOK_JAVA" -XX:AOTCache="$cache" "${java_args[@]}" org.foldbook.cli.Main "$@"
        fi
        # first run: the command runs as usual; the cache is trained afterwards, quietly and in the
        # background, on the command's own help (the JVM's notes about it go nowhere), so no user ever
        # sees them; two first runs at once write separate files
        tmp="$cache.$$.tmp"
        status=0
        "$FOLDBOOK_JAVA" "${java_args[@]}" org.foldbook.cli.Main "$@" || status=$?
        ( "$FOLDBOOK_JAVA" -XX:AOTCacheOutput="$tmp" -Xlog:aot=off -Xlog:cds=off "${java_args[@]}" \
            org.foldbook.cli.Main "${1:-help}" --help >/dev/null 2>&1 && [ -s "$tmp" ] && mv -f "$tmp" "$cache"
          rm -f "$tmp" "$tmp.config" ) </dev/null >/dev/null 2>&1 &
        exit "$status"
    fi
    exec "$FOLDBOOK_JAVA" -XX:SharedArchiveFile="$cache_dir/cli-$key.jsa" -XX:+AutoCreateSharedArchive \
        -Xlog:cds=off "${java_args[@]}" org.foldbook.cli.Main "$@"
fi
exec "$FOLDBOOK_JAVA" "${java_args[@]}" org.foldbook.cli.Main "$@"
