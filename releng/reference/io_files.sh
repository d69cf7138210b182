#!/bin/sh
# Writes the WAV reference files of the org.foldbook.io tests with Debian's sox (apt-get install -y sox),
# and beside each one a raw little-endian float64 dump of the same samples made by sox itself
# (sox scales integer codes by 1/2^(bits-1), and 8-bit unsigned as (code-128)/128, the same convention
# as our WAV reader). The tests compare our decoder with these dumps and with the JDK's javax.sound.
# Run from the repository root:  sh releng/reference/io_files.sh
# Signals are sox "synth" tones, one frequency per channel, -D (no dither) so reruns give the same bytes.
set -eu
OUT=bundles/org.foldbook.io.tests/resources/org/foldbook/io/wav/sox
mkdir -p "$OUT"
sox --version > "$OUT/SOX-VERSION.txt"

# name  channels  rate  encoding  bits
make() {
    name=$1; ch=$2; rate=$3; enc=$4; bits=$5
    tones=""
    i=0
    while [ $i -lt "$ch" ]; do
        tones="$tones sine $((300 + 700 * i))"
        i=$((i + 1))
    done
    # 0.8 of full scale, 240 frames; synth generates one tone per channel
    sox -D -r "$rate" -c "$ch" -n -e "$enc" -b "$bits" "$OUT/$name.wav" synth 240s $tones gain -1.94
    sox -D "$OUT/$name.wav" -t raw -e floating-point -b 64 -L "$OUT/$name.f64"
}

make u8-mono          1  8000 unsigned-integer 8
make s16-mono         1 32000 signed-integer  16
make s16-stereo       2 48000 signed-integer  16
make s16-3ch          3 44100 signed-integer  16
make s24-mono         1 96000 signed-integer  24
make s24-stereo       2 48000 signed-integer  24
make s24-6ch          6 48000 signed-integer  24
make s32-stereo       2 48000 signed-integer  32
make f32-stereo       2 48000 floating-point  32
make f32-4ch          4 22050 floating-point  32
make f64-mono         1 48000 floating-point  64
make f64-stereo       2 16000 floating-point  64
# raw (headerless) copies of one layout for the raw-binary reader: big-endian int16 and little-endian float32
RAW=bundles/org.foldbook.io.tests/resources/org/foldbook/io/raw/sox
mkdir -p "$RAW"
sox -D "$OUT/s24-stereo.wav" -t raw -e signed-integer -b 16 -B "$RAW/s16be-stereo.raw"
sox -D -t raw -e signed-integer -b 16 -B -r 48000 -c 2 "$RAW/s16be-stereo.raw" -t raw -e floating-point -b 64 -L "$RAW/s16be-stereo.f64"
sox -D "$OUT/f32-4ch.wav" -t raw -e floating-point -b 32 -L "$RAW/f32le-4ch.raw"
cp "$OUT/f32-4ch.f64" "$RAW/f32le-4ch.f64"
ls -l "$OUT" "$RAW"
