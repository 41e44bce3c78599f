package org.branchsim.cli;

import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Quantity;

/**
 * Limits of command-line options shared by the commands, checked before any run. Every refusal names the
 * option, what was expected and what was found (exit code 2).
 */
final class OptionChecks {

    /** Most variants a sweep grid or a tolerance study may have. */
    static final int MAX_VARIANTS = 10_000;
    /** Most threads a study may use. */
    static final int MAX_THREADS = 256;

    private OptionChecks() {
    }

    /**
     * @param asked the --threads value, or null for the default
     * @return the threads to use: the number of cores unless asked
     */
    static int threads(Integer asked) {
        if (asked == null) {
            return Runtime.getRuntime().availableProcessors();
        }
        return (int) count("--threads", asked, 1, MAX_THREADS);
    }

    /** @return {@code value} when it is within [min, max]; otherwise refuses it (OPTION_OUT_OF_RANGE) */
    static long count(String option, long value, long min, long max) {
        if (value < min || value > max) {
            throw outOfRange(option, "a whole number from " + min + " to " + max, String.valueOf(value));
        }
        return value;
    }

    /** @return the refusal of an option's value outside its limits: "OPTION: expected ..., found ..." */
    static BranchsimException outOfRange(String option, String expected, String found) {
        return new BranchsimException(ErrorKey.OPTION_OUT_OF_RANGE, option, expected, found);
    }

    /** @return the refusal of an option's text that cannot be read: "OPTION: expected ..., found ..." */
    static BranchsimException unreadable(String option, String expected, String found) {
        return new BranchsimException(ErrorKey.OPTION_UNREADABLE, option, expected, found);
    }

    /** @return the refusal of an option that names one thing twice: "OPTION: expected each WHAT once, found ..." */
    static BranchsimException repeated(String option, String what, String found) {
        return new BranchsimException(ErrorKey.OPTION_REPEATED, option, what, found);
    }

    /**
     * @param option the option's name, for the refusal
     * @param text the option's text, e.g. "0.3 s" (null when not given)
     * @param otherwise the value when the option is not given, s
     * @return the time, s
     * @throws BranchsimException OPTION_UNREADABLE when the text is not a time with its unit
     */
    static double time(String option, String text, double otherwise) {
        if (text == null) {
            return otherwise;
        }
        Quantity.Parsed p = Quantity.parse(text, Dimension.TIME);
        if (!p.ok()) {
            throw unreadable(option, "a time with its unit, e.g. \"0.3 s\"", "\"" + text + "\"");
        }
        return p.si();
    }
}
