package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The motors' block of metrics.json and summary.txt, on a motor whose steady state has a closed form. */
class MotorReportTest {

    private static final String SCENARIO = """
            { "name": "motor-on-a-pressure-source",
              "fluid": { "grade": "VG46", "temperature": "40 degC" },
              "nodes": [ { "id": "high", "type": "tank", "pressure": "100 bar" }, { "id": "tank", "type": "tank" },
                         { "id": "ret", "volume": "0.1 L" } ],
              "elements": [
                { "id": "winch", "type": "motor", "ports": { "a": "high", "b": "ret" },
                  "displacement": "10 cm^3/rev", "inertia": "0.01 kg*m^2", "damping": "0.05 N*m*s/rad",
                  "loadTorque": "5 N*m", "friction": { "coulomb": "5 N*m", "breakaway": "8 N*m" } },
                { "id": "drain", "type": "orifice", "ports": { "a": "ret", "b": "tank" }, "diameter": "12 mm" } ],
              "solver": { "endTime": "2 s", "outputInterval": "1 ms" },
              "outputs": { "units": "metric" } }
            """;

    /**
     * Torque balance at steady speed, D dp = T_c + B w + T_load (Merritt, Hydraulic Control Systems, 1967, motor
     * torque balance; Coulomb + viscous friction, Armstrong-Helouvry et al., Automatica 30(7), 1994): w =
     * (D dp - T_c - T_load)/B with dp = p_a - p_b read from the run (the motor's return passes an orifice); the
     * power is D dp w.
     */
    @Test
    void metricsAndSummaryCarryTheMotorsSpeedTorqueAndPower(@TempDir Path dir) throws IOException {
        Path scenario = Files.writeString(dir.resolve("winch.json"), SCENARIO, StandardCharsets.UTF_8);
        Path out = dir.resolve("out");
        RunCommandTest.Outcome o = RunCommandTest.run("run", scenario.toString(), "--out", out.toString());
        assertEquals(0, o.code(), o.err());
        JsonNode all = new ObjectMapper().readTree(out.resolve("metrics.json").toFile());
        double pb = all.at("/signals/ret.p/final").asDouble() * 1e5;
        assertTrue(pb > 0.0 && pb < 5e5, "a small back-pressure: " + pb);
        double d = 10e-6 / (2 * Math.PI);
        double torque = d * (100e5 - pb);
        double omega = (torque - 5.0 - 5.0) / 0.05;
        double rpm = omega * 60.0 / (2 * Math.PI);
        JsonNode m = all.at("/motors/0");
        assertEquals("winch", m.get("id").asText());
        assertEquals("rpm", m.get("speedUnit").asText());
        assertEquals(rpm, m.get("steadySpeed").asDouble(), 1e-4 * rpm);
        assertEquals(torque, m.get("steadyTorque").asDouble(), 1e-5 * torque);
        assertEquals(torque * omega / 1e3, m.get("peakPower").asDouble(), 1e-4 * torque * omega / 1e3, "kW");
        assertEquals(0.0, m.get("drivenByLoad_s").asDouble(), 0.0, "an active load never drives it");
        assertTrue(m.get("measuredFrom").asText().contains("D (p_a - p_b)"));
        String summary = Files.readString(out.resolve("summary.txt"), StandardCharsets.UTF_8);
        assertTrue(summary.contains("motor winch ("), summary);
        assertTrue(summary.contains(String.format(java.util.Locale.ROOT, "speed steady %.4g rpm", rpm)), summary);
    }
}
