package org.foldbook.io.hdf5;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.foldbook.io.ChannelInfo;
import org.foldbook.io.ReadOptions;
import org.foldbook.io.RecordingFormat;
import org.foldbook.io.RecordingFormatException;
import org.foldbook.io.RecordingInfo;
import org.foldbook.io.RecordingReader;
import org.foldbook.io.SampleType;
import org.foldbook.io.Sha256;
import org.foldbook.io.internal.Buffers;

import io.jhdf.HdfFile;
import io.jhdf.api.Attribute;
import io.jhdf.api.Dataset;
import io.jhdf.api.Group;
import io.jhdf.api.Node;

/**
 * Reads a 1-D (one channel) or 2-D (frames x channels, or channels x frames) numeric dataset of an HDF5
 * file through jhdf, in slices of bounded size. Attributes read when present (our naming, documented
 * here): {@code sample_rate} (S/s) or {@code sample_interval} (s), {@code units} (one string or one per
 * channel), {@code channel_names}, {@code channel_axis}. Values are returned as stored (no scaling); they
 * must be finite. jhdf maps the file read-only; its unchecked errors become {@link RecordingFormatException}.
 * The SHA-256 is computed by a separate read-only pass when asked for.
 */
public final class Hdf5Reader implements RecordingReader {
    private final RecordingInfo info;
    private final FileChannel channel;
    private final HdfFile hdf;
    private final Dataset dataset;
    private final int channelAxis;
    private final int blockFrames;
    private long framePosition;
    private String sha256;

    private Hdf5Reader(RecordingInfo info, FileChannel channel, HdfFile hdf, Dataset dataset, int channelAxis,
            int blockFrames) {
        this.info = info;
        this.channel = channel;
        this.hdf = hdf;
        this.dataset = dataset;
        this.channelAxis = channelAxis;
        this.blockFrames = blockFrames;
    }

    public static Hdf5Reader open(Path file) throws IOException {
        return open(file, Hdf5Selection.DETECT, ReadOptions.DEFAULT);
    }

    public static Hdf5Reader open(Path file, Hdf5Selection selection, ReadOptions options) throws IOException {
        FileChannel ch = FileChannel.open(file, StandardOpenOption.READ);
        HdfFile hdf;
        try {
            try {
                hdf = new HdfFile(ch);
            } catch (RuntimeException e) {
                throw new RecordingFormatException(file, "superblock", "not a readable HDF5 file: " + e.getMessage(), e);
            }
            return describe(file, ch, hdf, selection, options);
        } catch (IOException | RuntimeException e) {
            ch.close();
            if (e instanceof RuntimeException r) {
                throw new RecordingFormatException(file, "metadata", "HDF5 structure not readable: " + r, r);
            }
            throw e;
        }
    }

    private static Hdf5Reader describe(Path file, FileChannel ch, HdfFile hdf, Hdf5Selection sel, ReadOptions options)
            throws IOException {
        Dataset ds;
        if (sel.datasetPath() != null) {
            Node n;
            try {
                n = hdf.getByPath(sel.datasetPath());
            } catch (RuntimeException e) {
                throw new RecordingFormatException(file, sel.datasetPath(), "no such dataset");
            }
            if (!(n instanceof Dataset d)) {
                throw new RecordingFormatException(file, sel.datasetPath(), "is a group, not a dataset");
            }
            ds = d;
        } else {
            List<Dataset> found = new ArrayList<>();
            collect(hdf, found, new java.util.HashSet<>());
            if (found.size() != 1) {
                throw new RecordingFormatException(file, "/", found.isEmpty() ? "no numeric 1-D or 2-D dataset"
                        : "several numeric datasets, choose one: " + found.stream().map(Node::getPath).toList());
            }
            ds = found.get(0);
        }
        String where = "dataset " + ds.getPath();
        if (!numeric(ds)) {
            throw new RecordingFormatException(file, where, "not a numeric 1-D or 2-D dataset (type "
                    + ds.getJavaType().getSimpleName() + ", rank " + ds.getDimensions().length + ")");
        }
        long[] dims = ds.getDimensionsAsLong();
        int axis = sel.channelAxis();
        if (axis < 0) {
            axis = dims.length == 1 ? 1 : (int) number(ds, "channel_axis", 1);
            if (axis != 0 && axis != 1) {
                throw new RecordingFormatException(file, where, "attribute channel_axis = " + axis + " is not 0 or 1");
            }
        }
        long frames = dims.length == 1 ? dims[0] : dims[1 - axis];
        long channels = dims.length == 1 ? 1 : dims[axis];
        if (channels == 0) {
            throw new RecordingFormatException(file, where, "zero channels");
        }
        if (frames == 0) {
            throw new RecordingFormatException(file, where, "no frames");
        }
        if (channels > 65535) {
            throw new RecordingFormatException(file, where, channels + " channels: channel axis probably wrong");
        }
        double rate = sel.sampleRate();
        if (Double.isNaN(rate)) {
            double r = number(ds, "sample_rate", Double.NaN);
            double dt = number(ds, "sample_interval", Double.NaN);
            rate = !Double.isNaN(r) ? r : 1.0 / dt;
            if (!(rate > 0) || !Double.isFinite(rate)) {
                throw new RecordingFormatException(file, where,
                        "no usable sample_rate or sample_interval attribute and no rate given");
            }
        }
        List<String> units = strings(ds, "units");
        if (units.isEmpty()) {
            units = strings(ds, "unit");
        }
        List<String> names = strings(ds, "channel_names");
        List<ChannelInfo> infos = new ArrayList<>();
        for (int c = 0; c < channels; c++) {
            String name = names.size() == channels ? names.get(c)
                    : channels == 1 ? ds.getName() : ds.getName() + "[" + c + "]";
            String unit = units.size() == channels ? units.get(c) : units.size() == 1 ? units.get(0) : "";
            infos.add(new ChannelInfo(name, unit));
        }
        RecordingInfo info = new RecordingInfo(file, RecordingFormat.HDF5, infos, rate, frames, sampleType(ds),
                "stored value", Optional.empty(), 0);
        int block = (int) Math.max(1, Math.min(Integer.MAX_VALUE, options.bufferBytes() / (8 * channels)));
        return new Hdf5Reader(info, ch, hdf, ds, axis, block);
    }

    /** Depth-first search; hard links can make the group graph cyclic, so each object is visited once. */
    private static void collect(Group g, List<Dataset> out, java.util.Set<Long> visited) {
        if (!visited.add(g.getAddress())) {
            return;
        }
        for (Node n : g) {
            if (n.isLink()) {
                continue;
            }
            if (n instanceof Dataset d && numeric(d) && visited.add(d.getAddress())) {
                out.add(d);
            } else if (n instanceof Group sub) {
                collect(sub, out, visited);
            }
        }
    }

    private static boolean numeric(Dataset d) {
        Class<?> t = d.getJavaType();
        int rank = d.getDimensions().length;
        return !d.isScalar() && !d.isEmpty() && !d.isCompound() && (rank == 1 || rank == 2)
                && (t == double.class || t == float.class || t == long.class || t == int.class || t == short.class
                        || t == byte.class);
    }

    private static SampleType sampleType(Dataset d) {
        Class<?> t = d.getJavaType();
        return t == double.class ? SampleType.FLOAT64 : t == float.class ? SampleType.FLOAT32
                : t == long.class ? SampleType.INT64 : t == int.class ? SampleType.INT32
                        : t == short.class ? SampleType.INT16 : SampleType.INT8;
    }

    private static double number(Dataset d, String name, double fallback) {
        Attribute a = d.getAttribute(name);
        if (a == null) {
            return fallback;
        }
        Object v = a.getData();
        if (v != null && v.getClass().isArray() && java.lang.reflect.Array.getLength(v) == 1) {
            v = java.lang.reflect.Array.get(v, 0);
        }
        return v instanceof Number n ? n.doubleValue() : fallback;
    }

    private static List<String> strings(Dataset d, String name) {
        Attribute a = d.getAttribute(name);
        List<String> out = new ArrayList<>();
        if (a == null) {
            return out;
        }
        Object v = a.getData();
        if (v instanceof String s) {
            out.add(s);
        } else if (v instanceof String[] arr) {
            out.addAll(List.of(arr));
        }
        return out;
    }

    @Override
    public RecordingInfo info() {
        return info;
    }

    @Override
    public long framePosition() {
        return framePosition;
    }

    @Override
    public int read(double[][] channels, int offset, int maxFrames) throws IOException {
        Buffers.checkChannels(channels, offset, maxFrames, info.channelCount());
        return readInto(channels, null, offset, maxFrames);
    }

    @Override
    public int readInterleaved(double[] interleaved, int offset, int maxFrames) throws IOException {
        Buffers.checkInterleaved(interleaved, offset, maxFrames, info.channelCount());
        return readInto(null, interleaved, offset, maxFrames);
    }

    private int readInto(double[][] channels, double[] interleaved, int offset, int maxFrames) throws IOException {
        long remaining = info.frameCount() - framePosition;
        if (remaining == 0 && maxFrames > 0) {
            return -1;
        }
        int want = (int) Math.min(maxFrames, remaining);
        int cc = info.channelCount();
        int rank = dataset.getDimensions().length;
        for (int done = 0; done < want;) {
            int n = Math.min(blockFrames, want - done);
            long start = framePosition + done;
            Object slice;
            try {
                if (rank == 1) {
                    slice = dataset.getData(new long[] {start}, new int[] {n});
                } else if (channelAxis == 1) {
                    slice = dataset.getData(new long[] {start, 0}, new int[] {n, cc});
                } else {
                    slice = dataset.getData(new long[] {0, start}, new int[] {cc, n});
                }
            } catch (RuntimeException e) {
                throw new RecordingFormatException(info.file(), "dataset " + dataset.getPath() + ", frame " + start,
                        "slice not readable: " + e, e);
            }
            for (int i = 0; i < n; i++) {
                for (int c = 0; c < cc; c++) {
                    double v = rank == 1 ? element(slice, i) : channelAxis == 1
                            ? element(java.lang.reflect.Array.get(slice, i), c)
                            : element(java.lang.reflect.Array.get(slice, c), i);
                    if (!Double.isFinite(v)) {
                        throw new RecordingFormatException(info.file(), "dataset " + dataset.getPath() + ", frame "
                                + (start + i) + ", channel " + (c + 1), "NaN or infinite value");
                    }
                    if (channels != null) {
                        channels[c][offset + done + i] = v;
                    } else {
                        interleaved[offset + (done + i) * cc + c] = v;
                    }
                }
            }
            done += n;
        }
        framePosition += want;
        return want;
    }

    private static double element(Object array, int i) {
        if (array instanceof double[] d) {
            return d[i];
        } else if (array instanceof float[] f) {
            return f[i];
        } else if (array instanceof int[] a) {
            return a[i];
        } else if (array instanceof short[] s) {
            return s[i];
        } else if (array instanceof long[] l) {
            return l[i];
        } else if (array instanceof byte[] b) {
            return b[i];
        }
        return java.lang.reflect.Array.getDouble(array, i);
    }

    @Override
    public String sha256Hex() throws IOException {
        if (sha256 == null) {
            sha256 = Sha256.ofChannel(channel);
        }
        return sha256;
    }

    @Override
    public void close() throws IOException {
        // jhdf treats a file opened from our channel like an in-memory one and refuses close();
        // the channel is ours, and closing it releases the file
        channel.close();
    }
}
