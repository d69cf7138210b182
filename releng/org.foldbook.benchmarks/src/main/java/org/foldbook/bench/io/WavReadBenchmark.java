package org.foldbook.bench.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.security.MessageDigest;
import java.util.Random;
import java.util.concurrent.TimeUnit;

import org.foldbook.io.ReadOptions;
import org.foldbook.io.RecordingReader;
import org.foldbook.io.Sha256;
import org.foldbook.io.wav.WavReader;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;

/**
 * Time to read a whole stereo WAV file (32 MiB of synthetic random samples, in the page cache) with our
 * reader into per-channel double blocks, against a plain FileChannel read of the same file into a 1 MiB
 * direct buffer in the same run. Ratio = baseline time / reader time (goal >= 0.5). The hashing variants
 * compare reader + SHA-256 with FileChannel + SHA-256, since the digest dominates both.
 *
 * <pre>java -jar releng/org.foldbook.benchmarks/target/benchmarks.jar WavReadBenchmark</pre>
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgs = "--add-modules=jdk.incubator.vector")
public class WavReadBenchmark {
    private static final int DATA_BYTES = 32 << 20;

    @Param({"16", "24"})
    int bits;

    /** Frames per read call: 4096 (a typical FFT block, output stays in cache) and 65536. */
    @Param({"4096", "65536"})
    int blockFrames;

    Path file;
    double[][] block;

    @Setup(Level.Trial)
    public void write() throws IOException {
        block = new double[2][blockFrames];
        int bytes = bits / 8;
        int blockAlign = 2 * bytes;
        int data = DATA_BYTES / blockAlign * blockAlign;
        ByteBuffer h = ByteBuffer.allocate(44).order(ByteOrder.LITTLE_ENDIAN);
        h.put("RIFF".getBytes()).putInt(36 + data).put("WAVE".getBytes()).put("fmt ".getBytes()).putInt(16)
                .putShort((short) 1).putShort((short) 2).putInt(48000).putInt(48000 * blockAlign)
                .putShort((short) blockAlign).putShort((short) bits).put("data".getBytes()).putInt(data);
        byte[] samples = new byte[data];
        new Random(1).nextBytes(samples); // synthetic content; only the byte count matters here
        file = Files.createTempFile("foldbook-bench-", ".wav");
        try (FileChannel ch = FileChannel.open(file, StandardOpenOption.WRITE)) {
            ch.write(h.flip());
            ch.write(ByteBuffer.wrap(samples));
        }
    }

    @TearDown(Level.Trial)
    public void delete() throws IOException {
        Files.deleteIfExists(file);
    }

    @Benchmark
    public long baselineFileChannel() throws IOException {
        ByteBuffer b = ByteBuffer.allocateDirect(1 << 20);
        long sum = 0;
        try (FileChannel ch = FileChannel.open(file, StandardOpenOption.READ)) {
            while (ch.read(b.clear()) > 0) {
                sum += b.get(0);
            }
        }
        return sum;
    }

    @Benchmark
    public String baselineFileChannelSha256() throws IOException {
        MessageDigest md = Sha256.newDigest();
        ByteBuffer b = ByteBuffer.allocate(1 << 20);
        try (FileChannel ch = FileChannel.open(file, StandardOpenOption.READ)) {
            while (ch.read(b.clear()) > 0) {
                md.update(b.array(), 0, b.position());
            }
        }
        return Sha256.hex(md.digest());
    }

    @Benchmark
    public void reader(Blackhole bh) throws IOException {
        try (RecordingReader r = WavReader.open(file, ReadOptions.DEFAULT.withSha256(false))) {
            int n;
            while ((n = r.read(block, 0, block[0].length)) > 0) {
                bh.consume(block[1][n - 1]);
            }
        }
    }

    @Benchmark
    public String readerSha256() throws IOException {
        try (RecordingReader r = WavReader.open(file, ReadOptions.DEFAULT)) {
            while (r.read(block, 0, block[0].length) > 0) {
                // decode only
            }
            return r.sha256Hex();
        }
    }
}
