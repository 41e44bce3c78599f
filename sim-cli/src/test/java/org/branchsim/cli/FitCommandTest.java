package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code branchsim fit} on a record the model itself wrote (its trace.csv, in bar): a model that can reproduce
 * its data exactly has its least-squares optimum at the true values with zero residual (Bates and Watts,
 * Nonlinear Regression Analysis and Its Applications, 1988, ch. 2: the sum of squares is non-negative and zero
 * there), so the damping orifice is recovered from a start away from it; the fitted scenario is a valid scenario.
 */
class FitCommandTest {

    @Test
    void recoversTheDampingOrificeFromTheModelsOwnRecordAndWritesAValidScenario(@TempDir Path dir) throws IOException {
        // the record: the clamp branch with a 0.62 mm damping orifice; the scenario fitted has 0.7 mm
        Path truth = dir.resolve("truth.json");
        Files.writeString(truth, Files.readString(TuneCommandTest.CLAMP_BRANCH).replace("\"diameter\": \"0.7 mm\"",
                "\"diameter\": \"0.62 mm\""));
        Path run = dir.resolve("run");
        RunCommandTest.Outcome o = RunCommandTest.run("run", truth.toString(), "--out", run.toString());
        assertEquals(0, o.code(), o.err());
        Path out = dir.resolve("fit");
        o = RunCommandTest.run("fit", TuneCommandTest.CLAMP_BRANCH.toString(), run.resolve("trace.csv").toString(),
                "--map", "clampLine.p=clampLine.p", "--no-align", "--from", "0.1 s",
                "--free", "elements.reducer.dampingOrifice.diameter=0.5 mm..0.9 mm", "--starts", "3", "--descents", "1",
                "--iterations", "8", "--threads", "2", "--out", out.toString());
        assertEquals(0, o.code(), o.err());
        JsonNode json = new ObjectMapper().readTree(out.resolve("fit.json").toFile());
        JsonNode p = json.get("parameters").get(0);
        // trace.csv rounds pressures to its printed digits, so the recovery is close, not exact
        assertEquals(0.62, p.get("estimate").asDouble(), 0.002, o.out());
        assertTrue(json.get("costAfter").asDouble() < json.get("costBefore").asDouble(), o.out());
        assertTrue(o.out().contains("95 % CI"), o.out());
        RunCommandTest.Outcome check = RunCommandTest.run("check", out.resolve("fitted.json").toString());
        assertEquals(0, check.code(), check.err());
    }
}
