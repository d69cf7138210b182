package org.foldbook.io.fuzz;

import java.io.IOException;

import org.foldbook.io.ReadOptions;
import org.foldbook.io.csv.DelimitedTextReader;
import org.foldbook.io.csv.DelimitedTextSettings;

import com.code_intelligence.jazzer.junit.FuzzTest;

/**
 * Fuzzes the delimited-text reader, with detection only and with a given sample rate (which lets files
 * without a time column through to the value parser). Seeds in
 * fuzz/resources/org/foldbook/io/fuzz/DelimitedTextFuzzTestInputs/csv/.
 */
class DelimitedTextFuzzTest {
    @FuzzTest
    void csv(byte[] data) throws IOException {
        FuzzTarget.run(data, ".csv", f -> DelimitedTextReader.open(f));
        FuzzTarget.run(data, ".csv", f -> DelimitedTextReader.open(f, DelimitedTextSettings.DETECT.withSampleRate(100),
                ReadOptions.DEFAULT));
    }
}
