package org.foldbook.io;

import java.util.Objects;

/**
 * Name and physical unit of one channel. The unit is free text as found in the file ("m/s^2", "V");
 * an empty string means the file gave none. WAV readers report "FS": values are fractions of full scale.
 */
public record ChannelInfo(String name, String unit) {
    public ChannelInfo {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(unit, "unit");
    }
}
