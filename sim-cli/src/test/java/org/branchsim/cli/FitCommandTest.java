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

    /**
     * The shipped measured demo (made by the model with 0.6 % air, a 0.55 mm damping orifice and 90 N*s/m spool
     * damping, 2 psi Gaussian noise, psi units, a logger clock 1.3 s ahead; its header says so): fitted from the demo's
     * 0.1 %, 0.7 mm and 50 N*s/m, every value is recovered inside its 95 % interval, the record's offset is refined
     * to 1.3 s within a tenth of its 0.5 ms sample, and s^2 is about 1 (the weights are the noise): the
     * properties of least squares on a correct model with Gaussian noise (Bates and Watts 1988, ch. 2; Seber and
     * Wild 1989, ch. 5). The upper bound 1.3 on s^2 is the chi-square 99.9 % point for 1196 degrees of freedom
     * divided by them (about 1.13) with margin for the noise estimate from second differences.
     */
    @Test
    void recoversTheUnknownsOfTheMeasuredDemoWithinTheirIntervals(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("fit");
        RunCommandTest.Outcome o = RunCommandTest.run("fit", "../scenarios/fixture-clamp.json",
                "../scenarios/fixture-clamp-measured.csv", "--map", "P_clamp=clampLine.p", "--map",
                "P_spring=reducer.chamber.p", "--trigger", "P_clamp<30 bar",
                "--free", "fluid.airContent=0.05 %..1 %", "--free", "elements.reducer.dampingOrifice.diameter=0.4 mm..1 mm",
                "--free", "elements.reducer.spool.damping=20 N*s/m..150 N*s/m", "--from", "0.3 s", "--to", "0.6 s",
                "--starts", "6", "--descents", "1", "--iterations", "10", "--threads", "2", "--out", out.toString());
        assertEquals(0, o.code(), o.err());
        JsonNode json = new ObjectMapper().readTree(out.resolve("fit.json").toFile());
        double[] truth = {0.6, 0.55, 90.0};
        for (int k = 0; k < truth.length; k++) {
            JsonNode p = json.get("parameters").get(k);
            assertEquals(truth[k], p.get("estimate").asDouble(), p.get("halfWidth95").asDouble(),
                    p.get("path").asText() + "\n" + o.out());
        }
        assertEquals(1.3, json.get("refinedOffset_s").asDouble(), 5e-5, o.out());
        assertTrue(json.get("variance").asDouble() < 1.3, o.out());
    }
}
