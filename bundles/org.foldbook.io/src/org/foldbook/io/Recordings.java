package org.foldbook.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Locale;

import org.foldbook.io.csv.DelimitedTextReader;
import org.foldbook.io.csv.DelimitedTextSettings;
import org.foldbook.io.hdf5.Hdf5Reader;
import org.foldbook.io.hdf5.Hdf5Selection;
import org.foldbook.io.raw.RawLayout;
import org.foldbook.io.raw.RawReader;
import org.foldbook.io.wav.WavReader;

/**
 * Entry point: opens a recording read-only, choosing the reader from the descriptor, else from the
 * file's first bytes (RIFF/RF64/BW64, the HDF5 signature), else from a raw sidecar next to it, else from
 * the name (.csv, .tsv, .txt).
 */
public final class Recordings {
    private static final byte[] HDF5_SIGNATURE = {(byte) 0x89, 'H', 'D', 'F', '\r', '\n', 0x1A, '\n'};

    private Recordings() {
    }

    public static RecordingReader open(Path file) throws IOException {
        return open(file, null, ReadOptions.DEFAULT);
    }

    public static RecordingReader open(Path file, RecordingDescriptor descriptor) throws IOException {
        return open(file, descriptor, ReadOptions.DEFAULT);
    }

    /**
     * @param descriptor null, or a {@link RawLayout}, {@link DelimitedTextSettings} or {@link Hdf5Selection}
     * @throws IllegalArgumentException for a null file or an unknown descriptor class
     */
    public static RecordingReader open(Path file, RecordingDescriptor descriptor, ReadOptions options)
            throws IOException {
        if (file == null) {
            throw new IllegalArgumentException("file: null");
        }
        if (options == null) {
            throw new IllegalArgumentException("options: null");
        }
        if (descriptor instanceof RawLayout raw) {
            return RawReader.open(file, raw, options);
        }
        if (descriptor instanceof DelimitedTextSettings text) {
            return DelimitedTextReader.open(file, text, options);
        }
        if (descriptor instanceof Hdf5Selection sel) {
            return Hdf5Reader.open(file, sel, options);
        }
        if (descriptor != null) {
            throw new IllegalArgumentException("descriptor: unknown kind " + descriptor.getClass().getName());
        }
        byte[] head = new byte[8];
        int n;
        try (InputStream in = Files.newInputStream(file, StandardOpenOption.READ)) {
            n = in.readNBytes(head, 0, 8);
        }
        String magic = new String(head, 0, Math.min(n, 4), java.nio.charset.StandardCharsets.ISO_8859_1);
        if (magic.equals("RIFF") || magic.equals("RF64") || magic.equals("BW64")) {
            return WavReader.open(file, options);
        }
        if (n == 8 && java.util.Arrays.equals(head, HDF5_SIGNATURE)) {
            return Hdf5Reader.open(file, Hdf5Selection.DETECT, options);
        }
        if (Files.isRegularFile(RawLayout.sidecarOf(file))) {
            return RawReader.open(file, RawLayout.readSidecar(RawLayout.sidecarOf(file)), options);
        }
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".csv") || name.endsWith(".tsv") || name.endsWith(".txt")) {
            return DelimitedTextReader.open(file, DelimitedTextSettings.DETECT, options);
        }
        throw new RecordingFormatException(file, "byte offset 0", "unknown recording format: not WAV/RF64, not HDF5,"
                + " no " + RawLayout.SIDECAR_SUFFIX + " sidecar, and not named .csv/.tsv/.txt");
    }
}
