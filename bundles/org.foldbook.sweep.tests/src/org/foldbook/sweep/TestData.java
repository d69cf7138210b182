package org.foldbook.sweep;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;

/** Loads the committed reference files of the sweep tests from the classpath. */
final class TestData {
    static final String DIR = "/reference/sweep/";

    private TestData() {
    }

    static byte[] bytes(String name) {
        try (InputStream in = TestData.class.getResourceAsStream(DIR + name)) {
            if (in == null) {
                throw new IllegalStateException("test resource " + DIR + name + " not on the classpath");
            }
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static String text(String name) {
        return new String(bytes(name), StandardCharsets.UTF_8);
    }

    static InputStreamReader reader(String name) {
        return new InputStreamReader(new java.io.ByteArrayInputStream(bytes(name)), StandardCharsets.UTF_8);
    }

    /** Raw little-endian float64 samples. */
    static double[] float64(String name) {
        ByteBuffer b = ByteBuffer.wrap(bytes(name)).order(ByteOrder.LITTLE_ENDIAN);
        double[] x = new double[b.remaining() / 8];
        b.asDoubleBuffer().get(x);
        return x;
    }
}
