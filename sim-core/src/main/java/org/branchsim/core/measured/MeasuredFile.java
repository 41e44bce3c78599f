package org.branchsim.core.measured;

import java.util.List;

/**
 * The channels of one measured file.
 *
 * @param name file name (for messages)
 * @param channels its channels, in column order
 * @param timestamps true when the time column holds ISO timestamps (times are then s since the Unix epoch)
 */
public record MeasuredFile(String name, List<MeasuredChannel> channels, boolean timestamps) {

    /** Copies the list. */
    public MeasuredFile {
        channels = List.copyOf(channels);
    }
}
