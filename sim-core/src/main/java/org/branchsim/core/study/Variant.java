package org.branchsim.core.study;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * One variant of a study: the values given to each varied parameter, as written in a scenario (text with
 * unit, or a number for dimensionless values), in parameter order.
 *
 * @param index position of the variant in the study (0-based)
 * @param values value per parameter path
 */
public record Variant(int index, Map<String, Object> values) {

    /** @param index position; @param values values (copied, order kept) */
    public Variant {
        values = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(values));
    }
}
