package org.branchsim.core;

import static com.tngtech.archunit.base.DescribedPredicate.or;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.belongToAnyOf;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAPackage;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAnyPackage;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;
import static org.junit.jupiter.api.Assertions.assertEquals;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import java.io.File;
import java.io.FileInputStream;
import java.io.FileOutputStream;
import java.io.FileReader;
import java.io.FileWriter;
import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.branchsim.core.model.StateSlot;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The layering of DESIGN.md and DEVELOPERS.md, checked on the compiled classes of sim-core (ArchUnit): no package
 * cycles, files only in the scenario reader, no charts or command line in the core, only {@code solve} on
 * Hipparchus's ODE layer, elements blind to the state array's layout, laws as pure functions; and a
 * {@code package-info.java} in every package of every module. Two rules wait for the engine branch of issue 10
 * (item 3) and are disabled with the dependency they are waiting on named.
 */
class ArchitectureTest {

    private static final String CORE = "org.branchsim.core";
    private static JavaClasses core;

    @BeforeAll
    static void importCore() {
        core = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages(CORE);
    }

    @Test
    void noPackageCycles() {
        slices().matching(CORE + ".(*)..").should().beFreeOfCycles().check(core);
    }

    @Test
    void onlyTheScenarioReaderTouchesFiles() {
        noClasses().that().resideOutsideOfPackage(CORE + ".scenario..")
                .should().dependOnClassesThat(or(resideInAPackage("java.nio.file.."), belongToAnyOf(File.class,
                        FileInputStream.class, FileOutputStream.class, FileReader.class, FileWriter.class,
                        RandomAccessFile.class)))
                .check(core);
    }

    @Test
    void theCoreDrawsNoChartsAndKnowsNoCommandLine() {
        noClasses().should().dependOnClassesThat(resideInAnyPackage("org.jfree..", "java.awt..", "javax.imageio..",
                "javax.swing..", "org.branchsim.plots..", "org.branchsim.cli..", "picocli..")).check(core);
    }

    @Test
    void theScenarioReaderDoesNotDependOnTheSolver() {
        noClasses().that().resideInAPackage(CORE + ".scenario..")
                .should().dependOnClassesThat().resideInAPackage(CORE + ".solve..").check(core);
    }

    @Test
    void onlySolveKnowsTheOdeLayer() {
        noClasses().that().resideOutsideOfPackage(CORE + ".solve..")
                .should().dependOnClassesThat().resideInAPackage("org.hipparchus.ode..").check(core);
    }

    @Test
    void elementsAndPartsNeverSeeTheStateLayout() {
        noClasses().that().resideInAnyPackage(CORE + ".elements..", CORE + ".parts..")
                .should().callMethod(StateSlot.class, "solverIndex").check(core);
        noClasses().that().resideInAnyPackage(CORE + ".elements..", CORE + ".parts..")
                .should().dependOnClassesThat().resideInAnyPackage(CORE + ".solve..", CORE + ".scenario..",
                        CORE + ".analysis..", CORE + ".study..", "org.hipparchus..").check(core);
    }

    @Test
    void lawsArePureFunctionsOfNumbers() {
        classes().that().resideInAPackage(CORE + ".laws..")
                .should().onlyDependOnClassesThat().resideInAnyPackage("java.lang..", CORE + ".laws..").check(core);
    }

    @Test
    void theBottomPackagesDependOnNothingAbove() {
        noClasses().that().resideInAnyPackage(CORE + ".units..", CORE + ".error..", CORE + ".fluid..")
                .should().dependOnClassesThat().resideInAnyPackage(CORE + ".model..", CORE + ".parts..",
                        CORE + ".elements..", CORE + ".solve..", CORE + ".results..", CORE + ".scenario..",
                        CORE + ".analysis..", CORE + ".study..").check(core);
    }

    /** Every folder of main sources that holds a class holds a package-info.java saying what it is for. */
    @Test
    void everyPackageOfEveryModuleHasAPackageInfo() throws IOException {
        List<String> missing = new java.util.ArrayList<>();
        for (String module : new String[] {"sim-core", "sim-plots", "sim-cli"}) {
            Path root = Path.of("..", module, "src", "main", "java");
            try (Stream<Path> dirs = Files.walk(root)) {
                for (Path dir : dirs.filter(Files::isDirectory).toList()) {
                    boolean hasClass;
                    try (Stream<Path> files = Files.list(dir)) {
                        hasClass = files.anyMatch(f -> f.toString().endsWith(".java")
                                && !f.getFileName().toString().equals("package-info.java"));
                    }
                    if (hasClass && !Files.isRegularFile(dir.resolve("package-info.java"))) {
                        missing.add(root.relativize(dir).toString());
                    }
                }
            }
        }
        assertEquals(List.of(), missing, "packages without package-info.java");
    }
}
