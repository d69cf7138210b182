package org.foldbook.dsp.fft;

/**
 * Chooses, once per JVM, whether {@link RealFft} may use {@link VectorRealFft}: only when the module
 * {@code jdk.incubator.vector} is in the boot layer (the JVM was started with
 * {@code --add-modules jdk.incubator.vector}), its classes are reachable from this bundle (the OSGi import
 * of the package wired), a vector holds at least 4 doubles, and the system property
 * {@value #PROPERTY} is not {@code false}. Otherwise every transform runs in JTransforms, the scalar path.
 * The class {@link VectorRealFft} is not touched unless the module is there, so a JVM without it never
 * fails to link.
 */
final class FftKernels {
    /** {@code -Dfoldbook.fft.vector=false} turns the Vector API kernel off (for comparisons). */
    static final String PROPERTY = "foldbook.fft.vector";
    /**
     * Largest length given to the vector kernel: its working set (16 n bytes) stays in the first-level cache
     * up to here; beyond it the library, which also splits big transforms over threads, was faster
     * (FftBenchmark).
     */
    static final int MAX_VECTOR_LENGTH = 8192;

    private static final boolean VECTOR = probe();

    private FftKernels() {
    }

    /** True if this JVM can and may run the vector kernel. */
    static boolean vectorAvailable() {
        return VECTOR;
    }

    /** True if the module is in the boot layer (started with {@code --add-modules jdk.incubator.vector}). */
    static boolean vectorModuleInBootLayer() {
        return ModuleLayer.boot().findModule("jdk.incubator.vector").isPresent();
    }

    /** The vector kernel for length n, or null where the library is used. */
    static VectorRealFft vectorKernelFor(int n) {
        if (!VECTOR || Integer.bitCount(n) != 1 || n < VectorRealFft.minimumLength() || n > MAX_VECTOR_LENGTH) {
            return null;
        }
        return new VectorRealFft(n);
    }

    private static boolean probe() {
        if ("false".equalsIgnoreCase(System.getProperty(PROPERTY, "true")) || !vectorModuleInBootLayer()) {
            return false;
        }
        try {
            return VectorRealFft.lanes() >= 4;
        } catch (LinkageError e) { // module present, package not wired to this bundle
            return false;
        }
    }
}
