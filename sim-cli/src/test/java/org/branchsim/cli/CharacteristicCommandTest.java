package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.branchsim.core.error.ErrorKey;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code branchsim characteristic}: outputs on the regulation demo, the droop comparison, refusals. */
class CharacteristicCommandTest {

    private static final String DEMO = RunCommandTest.SCENARIOS.resolve("regulation-characteristic.json").toString();
    private static final Pattern DROOP = Pattern.compile("(\\w+): droop (\\S+) bar per L/min");

    @Test
    void regulationDemoWritesBothValvesAndThePilotValveDroopsLess(@TempDir Path dir) throws IOException {
        RunCommandTest.Outcome o = RunCommandTest.run("characteristic", DEMO, "--out", dir.toString());
        assertEquals(0, o.code(), o.err());
        // the demo's schedule: supply up over 1..3 s and down over 3.2..3.5 s; both demands up over 4..4.5 s and
        // down over 5..5.2 s (merged, one stretch per direction)
        assertTrue(o.out().contains("from 4 ramp stretch(es): supply pressure rising 1.000..3.000 s, supply pressure "
                + "falling 3.200..3.500 s, demand rising 4.000..4.500 s, demand falling 5.000..5.200 s"), o.out());
        assertTrue(Files.size(dir.resolve("characteristic-pilotReducer.png")) > 0);
        assertTrue(Files.size(dir.resolve("characteristic-directReducer.png")) > 0);
        List<String> csv = Files.readAllLines(dir.resolve("characteristic.csv"));
        assertEquals("valve,stretch,time [s],main flow [L/min],inlet pressure [bar],outlet pressure [bar],"
                + "drain flow [L/min]", csv.get(0));
        assertTrue(csv.stream().anyMatch(l -> l.startsWith("pilotReducer,demand falling,")), "falling demand rows");
        assertTrue(csv.stream().anyMatch(l -> l.startsWith("directReducer,supply pressure rising,")));
        // the supply ramp of the demo runs from 80 bar to 250 bar (its own schedule): the inlet column spans it
        double highest = csv.stream().skip(1).filter(l -> l.contains(",supply pressure rising,"))
                .mapToDouble(l -> Double.parseDouble(l.split(",")[4])).max().orElseThrow();
        assertEquals(250.0, highest, 1e-6);
        Matcher m = DROOP.matcher(o.out());
        double pilot = Double.NaN;
        double direct = Double.NaN;
        while (m.find()) {
            if (m.group(1).equals("pilotReducer")) {
                pilot = Double.parseDouble(m.group(2));
            } else if (m.group(1).equals("directReducer")) {
                direct = Double.parseDouble(m.group(2));
            }
        }
        // pilot operation reduces the droop of a reducing valve (common practice, no source); a reducing valve's
        // outlet pressure falls as its flow rises, so the droop is negative (common practice, no source)
        assertTrue(direct < 0, o.out());
        assertTrue(Math.abs(pilot) < Math.abs(direct), o.out());
        assertTrue(o.out().contains("regulation deviation"), o.out());
    }

    @Test
    void aScenarioWithoutRampOrWithoutTheValveIsRefused(@TempDir Path dir) throws IOException {
        String text = Files.readString(Path.of(DEMO));
        Path noRamp = dir.resolve("no-ramp.json");
        Files.writeString(noRamp, text.replaceAll("\"over\": \"[0-9.]+ s\"", "\"over\": \"0 s\""));
        RunCommandTest.Outcome o = RunCommandTest.run("characteristic", noRamp.toString(), "--out",
                dir.resolve("a").toString());
        assertEquals(2, o.code(), o.out());
        assertTrue(o.err().contains("no ramp"), o.err());
        RunCommandTest.Outcome v = RunCommandTest.run("characteristic", DEMO, "--valve", "nowhere", "--out",
                dir.resolve("b").toString());
        assertEquals(2, v.code(), v.out());
        assertTrue(v.err().contains("no reducing valve \"nowhere\"") && v.err().contains("pilotReducer"), v.err());
        assertSame(ErrorKey.NOTHING_TO_CHARACTERISE, keyOf("characteristic", noRamp.toString(), "--out",
                dir.resolve("c").toString()));
        assertSame(ErrorKey.NOTHING_TO_CHARACTERISE, keyOf("characteristic", DEMO, "--valve", "nowhere"));
    }

    /** @return the key of the exception a command line throws */
    private static ErrorKey keyOf(String... args) {
        return ErrorKeysTest.thrownBy(args).key();
    }
}
