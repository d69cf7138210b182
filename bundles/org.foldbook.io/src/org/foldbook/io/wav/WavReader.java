package org.foldbook.io.wav;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.foldbook.io.ChannelInfo;
import org.foldbook.io.ReadOptions;
import org.foldbook.io.RecordingFormat;
import org.foldbook.io.RecordingFormatException;
import org.foldbook.io.RecordingInfo;
import org.foldbook.io.RecordingReader;
import org.foldbook.io.SampleType;
import org.foldbook.io.internal.FrameStreamReader;
import org.foldbook.io.internal.SampleCodec;
import org.foldbook.io.internal.SequentialInput;

/**
 * Reads RIFF WAVE and RF64/BW64 files: PCM 8-bit unsigned, 16/24/32-bit signed, IEEE float 32/64, plain
 * or WAVE_FORMAT_EXTENSIBLE, any channel count. Chunks other than fmt, data and ds64 are skipped, with the
 * pad byte after odd-sized chunks. Integer samples are returned as fractions of full scale:
 * {@code code / 2^(bits-1)} (8-bit: {@code (code - 128) / 128}), so they lie in [-1, 1). Float samples
 * are returned unchanged and must be finite.
 *
 * <p>Layout references: Microsoft/IBM "Multimedia Programming Interface and Data Specifications 1.0"
 * (RIFF, fmt, data, pad byte), Microsoft "WAVE_FORMAT_EXTENSIBLE" (sub-format GUIDs), EBU Tech 3306 (RF64,
 * ds64 chunk), ITU-R BS.2088 (BW64, same layout).
 */
public final class WavReader {
    /** Bytes 2..15 of the KSDATAFORMAT_SUBTYPE_* GUIDs; bytes 0..1 hold the format code (little-endian). */
    private static final byte[] GUID_TAIL = {0x00, 0x00, 0x00, 0x00, 0x10, 0x00, (byte) 0x80, 0x00, 0x00,
            (byte) 0xAA, 0x00, 0x38, (byte) 0x9B, 0x71};
    static final int PCM = 1;
    static final int IEEE_FLOAT = 3;
    static final int EXTENSIBLE = 0xFFFE;
    private static final long RF64_SIZE_IN_DS64 = 0xFFFFFFFFL;

    private WavReader() {
    }

    public static RecordingReader open(Path file) throws IOException {
        return open(file, ReadOptions.DEFAULT);
    }

    public static RecordingReader open(Path file, ReadOptions options) throws IOException {
        FileChannel ch = FileChannel.open(file, StandardOpenOption.READ);
        try {
            WavLayout layout = parse(file, ch);
            SampleType t = layout.sampleType();
            double scale;
            double offset = 0;
            String scaling;
            switch (t) {
            case UINT8 -> {
                scale = 1.0 / 128;
                offset = -1.0;
                scaling = "(code - 128) / 128, fraction of full scale";
            }
            case INT16, INT24, INT32 -> {
                int bits = 8 * t.bytes();
                scale = Math.scalb(1.0, -(bits - 1));
                scaling = "code / 2^" + (bits - 1) + ", fraction of full scale";
            }
            default -> {
                scale = 1.0;
                scaling = "stored floating-point value";
            }
            }
            List<ChannelInfo> channels = new ArrayList<>();
            for (int c = 1; c <= layout.channels(); c++) {
                channels.add(new ChannelInfo("ch" + c, "FS"));
            }
            RecordingInfo info = new RecordingInfo(file, layout.rf64() ? RecordingFormat.RF64 : RecordingFormat.WAV,
                    channels, layout.sampleRate(), layout.frameCount(), t, scaling, Optional.empty(), 0);
            SampleCodec codec = SampleCodec.uniform(t, ByteOrder.LITTLE_ENDIAN, layout.channels(), scale, offset);
            // the buffer must hold at least one frame (65535 channels of 8 bytes fit in 512 KiB)
            int buffer = Math.max(options.bufferBytes(), layout.blockAlign());
            SequentialInput input = new SequentialInput(file, ch, buffer, options.sha256());
            return new FrameStreamReader(info, input, codec, layout.dataOffset());
        } catch (IOException | RuntimeException e) {
            ch.close();
            throw e;
        }
    }

    /** Reads the header chunks (positional reads only) and validates what they declare. */
    public static WavLayout parse(Path file, FileChannel ch) throws IOException {
        long size = ch.size();
        if (size < 12) {
            throw RecordingFormatException.atByte(file, 0,
                    "file of " + size + " bytes is too short for a RIFF/RF64 header (12 bytes)");
        }
        ByteBuffer head = readAt(file, ch, 0, 12);
        String id = fourCc(head, 0);
        boolean rf64 = id.equals("RF64") || id.equals("BW64");
        if (!id.equals("RIFF") && !rf64) {
            throw RecordingFormatException.atByte(file, 0, "not a WAV file: starts with '" + printable(id)
                    + "', expected 'RIFF', 'RF64' or 'BW64'");
        }
        if (!fourCc(head, 8).equals("WAVE")) {
            throw RecordingFormatException.atByte(file, 8,
                    "RIFF form type is '" + printable(fourCc(head, 8)) + "', expected 'WAVE'");
        }
        long riffEnd = 8 + u32(head, 4);
        long pos = 12;
        long ds64Data = -1;
        Map<String, Long> ds64Table = new HashMap<>();
        if (rf64) {
            ByteBuffer dh = readAt(file, ch, pos, 8);
            long dsSize = u32(dh, 4);
            if (!fourCc(dh, 0).equals("ds64") || dsSize < 28) {
                throw RecordingFormatException.atByte(file, pos,
                        "RF64 file without a valid ds64 chunk first (found '" + printable(fourCc(dh, 0)) + "')");
            }
            ByteBuffer ds = readAt(file, ch, pos + 8, 28);
            riffEnd = 8 + ds.getLong(0);
            ds64Data = ds.getLong(8);
            long tableLength = u32(ds, 24);
            if (28 + 12 * tableLength > dsSize) {
                throw RecordingFormatException.atByte(file, pos + 32,
                        "ds64 table of " + tableLength + " entries does not fit the ds64 chunk of " + dsSize + " bytes");
            }
            for (int i = 0; i < tableLength; i++) {
                ByteBuffer e = readAt(file, ch, pos + 8 + 28 + 12L * i, 12);
                ds64Table.put(fourCc(e, 0), e.getLong(4));
            }
            if (ds64Data < 0) {
                throw RecordingFormatException.atByte(file, pos + 16, "ds64 data size " + ds64Data + " is negative");
            }
            pos += 8 + dsSize + (dsSize & 1);
        }
        if (riffEnd > size) {
            throw RecordingFormatException.atByte(file, rf64 ? 20 : 4, "RIFF size declares " + riffEnd
                    + " bytes but the file has " + size + " (truncated file, or declared size beyond the file)");
        }
        ByteBuffer fmt = null;
        long fmtPos = -1;
        long dataOffset = -1;
        long dataSize = -1;
        while (pos + 8 <= riffEnd && (fmt == null || dataOffset < 0)) {
            ByteBuffer h = readAt(file, ch, pos, 8);
            String chunk = fourCc(h, 0);
            long chunkSize = u32(h, 4);
            if (rf64 && chunkSize == RF64_SIZE_IN_DS64) {
                if (chunk.equals("data")) {
                    chunkSize = ds64Data;
                } else if (ds64Table.containsKey(chunk)) {
                    chunkSize = ds64Table.get(chunk);
                }
            }
            long body = pos + 8;
            if (chunkSize < 0) {
                throw RecordingFormatException.atByte(file, pos, "chunk '" + printable(chunk)
                        + "' has a negative 64-bit size " + chunkSize + " in the ds64 table");
            }
            if (chunkSize > riffEnd - body) {
                String what = chunk.equals("data") ? "truncated data chunk" : "declared size beyond the file";
                throw RecordingFormatException.atByte(file, pos, "chunk '" + printable(chunk) + "' declares "
                        + chunkSize + " bytes from offset " + body + " but the RIFF form ends at " + riffEnd + " (" + what + ")");
            }
            if (chunk.equals("fmt ")) {
                if (chunkSize < 16 || chunkSize > 4096) {
                    throw RecordingFormatException.atByte(file, pos, "fmt chunk size " + chunkSize + " is outside 16..4096");
                }
                fmt = readAt(file, ch, body, (int) chunkSize);
                fmtPos = body;
            } else if (chunk.equals("data")) {
                dataOffset = body;
                dataSize = chunkSize;
            }
            pos = body + chunkSize + (chunkSize & 1);
        }
        if (fmt == null) {
            throw RecordingFormatException.atByte(file, 12, "no fmt chunk before the end of the RIFF form");
        }
        if (dataOffset < 0) {
            throw RecordingFormatException.atByte(file, 12, "no data chunk before the end of the RIFF form");
        }
        return layout(file, rf64, fmt, fmtPos, dataOffset, dataSize);
    }

    private static WavLayout layout(Path file, boolean rf64, ByteBuffer fmt, long fmtPos, long dataOffset,
            long dataSize) throws RecordingFormatException {
        int tag = u16(fmt, 0);
        int channels = u16(fmt, 2);
        long rate = u32(fmt, 4);
        int blockAlign = u16(fmt, 12);
        int bits = u16(fmt, 14);
        int sampleFormat = tag;
        int validBits = bits;
        long mask = 0;
        if (tag == EXTENSIBLE) {
            if (fmt.capacity() < 40 || u16(fmt, 16) < 22) {
                throw RecordingFormatException.atByte(file, fmtPos + 16,
                        "extensible fmt chunk too short for its 22-byte extension");
            }
            validBits = u16(fmt, 18);
            mask = u32(fmt, 20);
            sampleFormat = u16(fmt, 24);
            for (int i = 0; i < GUID_TAIL.length; i++) {
                if (fmt.get(26 + i) != GUID_TAIL[i]) {
                    throw RecordingFormatException.atByte(file, fmtPos + 24,
                            "unknown sub-format GUID in the extensible fmt chunk");
                }
            }
        }
        if (channels == 0) {
            throw RecordingFormatException.atByte(file, fmtPos + 2, "zero channels declared");
        }
        if (rate == 0) {
            throw RecordingFormatException.atByte(file, fmtPos + 4, "sample rate 0 declared");
        }
        if (blockAlign == 0 || blockAlign % channels != 0) {
            throw RecordingFormatException.atByte(file, fmtPos + 12, "block align " + blockAlign
                    + " is not a whole number of bytes per sample for " + channels + " channels");
        }
        int container = blockAlign / channels;
        if (bits == 0 || bits > 8 * container || validBits == 0 || validBits > bits) {
            throw RecordingFormatException.atByte(file, fmtPos + 14, "bits per sample " + bits + " (valid "
                    + validBits + ") do not fit the " + container + "-byte sample container");
        }
        SampleType type = switch (sampleFormat) {
        case PCM -> switch (container) {
            case 1 -> SampleType.UINT8;
            case 2 -> SampleType.INT16;
            case 3 -> SampleType.INT24;
            case 4 -> SampleType.INT32;
            default -> null;
            };
        case IEEE_FLOAT -> switch (container) {
            case 4 -> SampleType.FLOAT32;
            case 8 -> SampleType.FLOAT64;
            default -> null;
            };
        default -> throw RecordingFormatException.atByte(file, tag == EXTENSIBLE ? fmtPos + 24 : fmtPos,
                String.format("unknown format code 0x%04X (supported: PCM 0x0001, IEEE float 0x0003, "
                        + "as such or inside WAVE_FORMAT_EXTENSIBLE 0xFFFE)", sampleFormat));
        };
        if (type == null) {
            throw RecordingFormatException.atByte(file, fmtPos + 12, "unsupported " + container + "-byte samples for "
                    + (sampleFormat == PCM ? "PCM" : "IEEE float"));
        }
        if (dataSize % blockAlign != 0) {
            throw RecordingFormatException.atByte(file, dataOffset - 4, "data chunk size " + dataSize
                    + " is not a whole number of " + blockAlign + "-byte frames");
        }
        return new WavLayout(rf64, tag, sampleFormat, channels, rate, blockAlign, validBits, mask, type,
                dataOffset, dataSize);
    }

    private static ByteBuffer readAt(Path file, FileChannel ch, long pos, int n) throws IOException {
        ByteBuffer b = ByteBuffer.allocate(n).order(ByteOrder.LITTLE_ENDIAN);
        while (b.hasRemaining()) {
            int r = ch.read(b, pos + b.position());
            if (r < 0) {
                throw RecordingFormatException.atByte(file, pos + b.position(),
                        "file ends inside a header (needed " + n + " bytes from offset " + pos + ")");
            }
        }
        return b.flip();
    }

    private static String fourCc(ByteBuffer b, int at) {
        byte[] id = new byte[4];
        b.get(at, id);
        return new String(id, StandardCharsets.ISO_8859_1);
    }

    private static String printable(String id) {
        StringBuilder sb = new StringBuilder();
        for (char c : id.toCharArray()) {
            sb.append(c >= 0x20 && c < 0x7F ? String.valueOf(c) : String.format("\\x%02X", (int) c));
        }
        return sb.toString();
    }

    private static int u16(ByteBuffer b, int at) {
        return b.getShort(at) & 0xFFFF;
    }

    private static long u32(ByteBuffer b, int at) {
        return b.getInt(at) & 0xFFFFFFFFL;
    }
}
