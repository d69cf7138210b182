# Sourced by the scripts: sets FOLDBOOK_JAVA_HOME and FOLDBOOK_JAVA to a JDK 21 or newer.
# Order: $JAVA_HOME if it is new enough, else the newest JDK under /usr/lib/jvm that is.
# The build (Tycho 5) and the product both need Java 21+; Java 17 is not enough.
foldbook_java_major() {
    # the JDK's release file when it has one (no JVM start: this runs before every command), else ask java
    local v=""
    [ -f "$1/release" ] && v=$(sed -n 's/^JAVA_VERSION="\([0-9]*\).*/\1/p' "$1/release" | head -n 1)
    [ -n "$v" ] || v=$("$1/bin/java" -XshowSettings:properties -version 2>&1 | sed -n 's/^ *java.specification.version = //p' | head -n 1)
    echo "$v"
}
FOLDBOOK_JAVA_HOME=""
if [ -n "${JAVA_HOME:-}" ] && [ -x "$JAVA_HOME/bin/java" ] && [ "$(foldbook_java_major "$JAVA_HOME")" -ge 21 ] 2>/dev/null; then
    FOLDBOOK_JAVA_HOME="$JAVA_HOME"
else
    best=0
    for jdk in /usr/lib/jvm/*; do
        [ -x "$jdk/bin/javac" ] || continue
        v=$(foldbook_java_major "$jdk")
        if [ -n "$v" ] && [ "$v" -ge 21 ] 2>/dev/null && [ "$v" -gt "$best" ]; then
            best=$v
            FOLDBOOK_JAVA_HOME="$jdk"
        fi
    done
fi
if [ -z "$FOLDBOOK_JAVA_HOME" ]; then
    echo "foldbook: no JDK 21 or newer found. Set JAVA_HOME to one, or install one under /usr/lib/jvm." >&2
    exit 4
fi
export JAVA_HOME="$FOLDBOOK_JAVA_HOME"
FOLDBOOK_JAVA="$FOLDBOOK_JAVA_HOME/bin/java"
