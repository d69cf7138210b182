package org.foldbook.io.fuzz;

import java.io.IOException;

import org.foldbook.io.ReadOptions;
import org.foldbook.io.wav.WavReader;

import com.code_intelligence.jazzer.junit.FuzzTest;

/**
 * Fuzzes the WAV/RF64 reader. Seeds (the sox reference files and every crash found) live in
 * fuzz/resources/org/foldbook/io/fuzz/WavReaderFuzzTestInputs/wav/ and are replayed during verify.
 */
class WavReaderFuzzTest {
    @FuzzTest
    void wav(byte[] data) throws IOException {
        FuzzTarget.run(data, ".wav", f -> WavReader.open(f, new ReadOptions(true, 4096)));
    }
}
