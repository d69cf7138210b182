package org.foldbook.io.wav;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Test-only RIFF assembly (synthetic variants of the sox files): splits a WAV into its chunks and
 * rebuilds it with chunks added, re-ordered or wrapped as RF64 (layout per EBU Tech 3306: 'RF64', size
 * 0xFFFFFFFF, 'WAVE', then a ds64 chunk holding riffSize, dataSize, sampleCount and an empty table).
 */
final class RiffFiles {
    private RiffFiles() {
    }

    /** The chunks of a RIFF WAVE file, id to body, in file order. */
    static Map<String, byte[]> chunks(byte[] wav) {
        ByteBuffer b = ByteBuffer.wrap(wav).order(ByteOrder.LITTLE_ENDIAN);
        Map<String, byte[]> out = new LinkedHashMap<>();
        int pos = 12;
        while (pos + 8 <= wav.length) {
            String id = new String(wav, pos, 4, StandardCharsets.US_ASCII);
            int size = b.getInt(pos + 4);
            byte[] body = new byte[size];
            System.arraycopy(wav, pos + 8, body, 0, size);
            out.put(id, body);
            pos += 8 + size + (size & 1);
        }
        return out;
    }

    static byte[] chunk(String id, byte[] body) {
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        o.writeBytes(id.getBytes(StandardCharsets.US_ASCII));
        o.writeBytes(le32(body.length));
        o.writeBytes(body);
        if ((body.length & 1) == 1) {
            o.write(0);
        }
        return o.toByteArray();
    }

    static byte[] riff(byte[]... chunks) {
        ByteArrayOutputStream body = new ByteArrayOutputStream();
        body.writeBytes("WAVE".getBytes(StandardCharsets.US_ASCII));
        for (byte[] c : chunks) {
            body.writeBytes(c);
        }
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        o.writeBytes("RIFF".getBytes(StandardCharsets.US_ASCII));
        o.writeBytes(le32(body.size()));
        o.writeBytes(body.toByteArray());
        return o.toByteArray();
    }

    /** RF64 with fmt then data whose 32-bit size field is 0xFFFFFFFF (the real size is in ds64). */
    static byte[] rf64(byte[] fmt, byte[] data, int blockAlign) {
        byte[] header = rf64Header(fmt, data.length, blockAlign);
        byte[] out = new byte[header.length + data.length];
        System.arraycopy(header, 0, out, 0, header.length);
        System.arraycopy(data, 0, out, header.length, data.length);
        return out;
    }

    /** Everything of an RF64 file before the sample bytes. */
    static byte[] rf64Header(byte[] fmt, long dataBytes, int blockAlign) {
        ByteBuffer ds64 = ByteBuffer.allocate(28).order(ByteOrder.LITTLE_ENDIAN);
        long riffSize = 4 + (8 + 28) + (8 + fmt.length + (fmt.length & 1)) + 8 + dataBytes + (dataBytes & 1);
        ds64.putLong(riffSize).putLong(dataBytes).putLong(dataBytes / blockAlign).putInt(0);
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        o.writeBytes("RF64".getBytes(StandardCharsets.US_ASCII));
        o.writeBytes(le32(-1));
        o.writeBytes("WAVE".getBytes(StandardCharsets.US_ASCII));
        o.writeBytes(chunk("ds64", ds64.array()));
        o.writeBytes(chunk("fmt ", fmt));
        o.writeBytes("data".getBytes(StandardCharsets.US_ASCII));
        o.writeBytes(le32(-1));
        return o.toByteArray();
    }

    static byte[] le32(int v) {
        return ByteBuffer.allocate(4).order(ByteOrder.LITTLE_ENDIAN).putInt(v).array();
    }
}
