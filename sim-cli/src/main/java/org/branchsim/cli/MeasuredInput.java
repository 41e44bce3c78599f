package org.branchsim.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.charset.CharacterCodingException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.measured.Alignment;
import org.branchsim.core.measured.ChannelMapping;
import org.branchsim.core.measured.ChannelSet;
import org.branchsim.core.measured.MeasuredCsv;
import org.branchsim.core.measured.MeasuredFile;
import org.branchsim.core.measured.Measurement;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Quantity;
import picocli.CommandLine.Option;

/**
 * The measured files, the mapping of their channels to circuit signals and the alignment options shared by
 * {@code compare} and {@code fit}. Alignment: by a trigger when {@code --trigger} is given, none with
 * {@code --no-align}, otherwise by cross-correlation of the first mapped channel with its simulated signal.
 */
public final class MeasuredInput {

    /** Largest measured file read, bytes. */
    static final long MAX_FILE_BYTES = 200L * 1024 * 1024;
    private static final Pattern TRIGGER = Pattern.compile("^\\s*(.+?)\\s*([<>])\\s*(.+?)\\s*$");

    /** Description of the MEASURED positional parameter each command declares (index 1..*). */
    static final String FILES_DESCRIPTION = "Data-logger CSV file(s): time column (t [s], t [ms] or ISO timestamps), "
            + "then channels \"NAME [unit]\".";

    private List<Path> files = new ArrayList<>();

    @Option(names = "--map", required = true, paramLabel = "COLUMN[ [unit]]=SIGNAL",
            description = "Which circuit signal a column records, e.g. \"P2 [psi]=clampLine.p\" (repeatable).")
    private List<String> maps = new ArrayList<>();

    @Option(names = "--trigger", paramLabel = "COLUMN>LEVEL",
            description = "Align where a mapped column first rises above (>) or falls below (<) a level, e.g. "
                    + "\"P2>20 bar\"; the same crossing of its signal in the simulation is time zero's match.")
    private String trigger;

    @Option(names = "--no-align", description = "Take the logger's times as the simulation's (no alignment).")
    private boolean noAlign;

    /** How the measured records were put on the simulation's time. @param offset s @param how in words */
    public record Aligned(List<Measurement> measurements, double offset, String how) {
    }

    /** @return the measured files given */
    public List<Path> files() {
        return files;
    }

    /** @param given the measured files the command was given */
    void files(List<Path> given) {
        files = List.copyOf(given);
    }

    /** @return the mappings, checked for form and repetition */
    List<ChannelMapping> mappings() {
        List<ChannelMapping> out = new ArrayList<>();
        for (String m : maps) {
            ChannelMapping cm = ChannelMapping.parse(m);
            if (cm == null) {
                throw OptionChecks.unreadable("--map", "COLUMN=SIGNAL or \"COLUMN [unit]=SIGNAL\", e.g. "
                        + "\"P2 [psi]=clampLine.p\"", "\"" + m + "\"");
            }
            for (ChannelMapping o : out) {
                if (o.column().equals(cm.column()) || o.signal().equals(cm.signal())) {
                    throw OptionChecks.repeated("--map", "column and signal", "\"" + m + "\"");
                }
            }
            out.add(cm);
        }
        return out;
    }

    /**
     * Reads every file, checks the mapping against the circuit and returns the mapped channels.
     *
     * @param circuit the scenario's circuit
     * @return one measurement per mapping, on the logger's time
     */
    public List<Measurement> read(CircuitModel circuit) {
        List<ChannelMapping> mappings = mappings();
        Map<String, String> units = new LinkedHashMap<>();
        for (ChannelMapping m : mappings) {
            if (m.unit() != null) {
                units.put(m.column(), m.unit());
            }
        }
        List<MeasuredFile> read = new ArrayList<>();
        for (Path f : files) {
            read.add(MeasuredCsv.read(f.toString(), text(f), units));
        }
        String examples = circuit.signals().stream().limit(6).map(SignalHandle::name).collect(Collectors.joining(", "));
        return ChannelSet.map(read, mappings, s -> {
            SignalHandle h = circuit.signal(s);
            return h == null ? null : h.dimension();
        }, examples);
    }

    private static String text(Path f) {
        try {
            if (!Files.isRegularFile(f)) {
                throw unreadable(f, Files.exists(f) ? "a folder or special file" : "no such file");
            }
            if (Files.size(f) > MAX_FILE_BYTES) {
                throw unreadable(f, "a file of " + Files.size(f) + " bytes (at most " + MAX_FILE_BYTES + " are read)");
            }
            return StandardCharsets.UTF_8.newDecoder().decode(java.nio.ByteBuffer.wrap(Files.readAllBytes(f))).toString();
        } catch (CharacterCodingException e) {
            throw unreadable(f, "bytes that are not UTF-8 text");
        } catch (IOException e) {
            throw unreadable(f, e.getClass().getSimpleName() + " " + e.getMessage());
        }
    }

    private static BranchsimException unreadable(Path f, String found) {
        return new BranchsimException(ErrorKey.MEASURED_FILE_INVALID, f.toString(), "1", "1", "(whole file)",
                "a readable UTF-8 text file", found);
    }

    /**
     * Puts the measured records on the simulation's time.
     *
     * @param measured the mapped channels on the logger's time
     * @param trace a run of the scenario
     * @return the shifted records, the offset and how it was found
     */
    public Aligned align(List<Measurement> measured, Trace trace) {
        if (noAlign) {
            return new Aligned(measured, 0.0, "none (logger times taken as simulation times)");
        }
        double offset;
        String how;
        if (trigger != null) {
            Matcher m = TRIGGER.matcher(trigger);
            Measurement ch = null;
            if (m.matches()) {
                for (Measurement x : measured) {
                    if (x.channel().equals(m.group(1)) || x.signal().equals(m.group(1))) {
                        ch = x;
                    }
                }
            }
            if (ch == null) {
                throw OptionChecks.unreadable("--trigger", "COLUMN>LEVEL or COLUMN<LEVEL with a mapped column, e.g. "
                        + "\"P2>20 bar\"", "\"" + trigger + "\"");
            }
            Dimension d = trace.columns().get(trace.indexOf(ch.signal())).dimension();
            Quantity.Parsed level = Quantity.parse(m.group(3), d);
            if (!level.ok()) {
                throw OptionChecks.unreadable("--trigger", "a level of " + d.humanName() + " with its unit, e.g. "
                        + "\"P2>20 bar\"", "\"" + m.group(3) + "\"");
            }
            offset = Alignment.byTrigger(ch.time(), ch.values(), trace.times(), trace.series(ch.signal()), level.si(),
                    m.group(2).equals(">"), trigger);
            how = "by trigger " + trigger;
        } else {
            Measurement first = measured.get(0);
            offset = Alignment.byCrossCorrelation(first.time(), first.values(), trace.times(),
                    trace.series(first.signal()));
            how = "by cross-correlation of " + first.channel() + " with " + first.signal();
        }
        List<Measurement> out = new ArrayList<>();
        for (Measurement x : measured) {
            out.add(x.shifted(offset));
        }
        return new Aligned(out, offset, how);
    }
}
