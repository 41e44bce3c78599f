package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.Map;
import org.junit.jupiter.api.Test;
import picocli.CommandLine.Command;

/**
 * Only the named subcommand is built at start-up: every name and alias must still start its own command, and the
 * top-level help must still list every command.
 */
class SubcommandRegistryTest {

    @Test
    void everyNameAUserMayTypeStartsItsCommandAlone() {
        for (Map.Entry<String, Class<?>> e : BranchsimMain.SUBCOMMANDS.entrySet()) {
            if (e.getKey().equals("help")) {
                continue;
            }
            StringWriter out = new StringWriter();
            assertEquals(0, BranchsimMain.execute(new PrintWriter(out), new PrintWriter(new StringWriter()),
                    e.getKey(), "--help"), e.getKey());
            String name = e.getValue().getAnnotation(Command.class).name();
            assertTrue(out.toString().startsWith("Usage: branchsim " + name + " "), e.getKey() + ":\n" + out);
        }
    }

    @Test
    void theTopLevelHelpListsEveryCommandAndAStartedCommandRuns() {
        StringWriter out = new StringWriter();
        assertEquals(0, BranchsimMain.execute(new PrintWriter(out), new PrintWriter(new StringWriter()), "--help"));
        for (Class<?> command : new java.util.LinkedHashSet<>(BranchsimMain.SUBCOMMANDS.values())) {
            String name = command.getAnnotation(Command.class).name();
            String help = out.toString();
            assertTrue(help.contains("\n  " + name + " ") || help.contains("\n  " + name + ","), name + " in\n" + help);
        }
        StringWriter version = new StringWriter();
        assertEquals(0, BranchsimMain.execute(new PrintWriter(version), new PrintWriter(new StringWriter()), "-V"));
        assertTrue(version.toString().startsWith("branchsim "), version.toString());
        StringWriter alias = new StringWriter();
        assertEquals(0, BranchsimMain.execute(new PrintWriter(alias), new PrintWriter(new StringWriter()), "bench",
                "--help"), "the timing command under its other name");
        assertTrue(alias.toString().contains("timing"), alias.toString());
    }
}
