package lotgate;

import static com.tngtech.archunit.base.DescribedPredicate.not;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAPackage;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.Architectures.layeredArchitecture;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** The packages are layers: a lower layer never imports a higher one, and the mathematics imports nothing of ours. */
class ArchitectureTest {
    private static JavaClasses classes;

    @BeforeAll
    static void importMainClasses() {
        classes = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("lotgate");
    }

    @Test
    void noLayerImportsALayerAboveIt() {
        layeredArchitecture().consideringOnlyDependenciesInLayers()
                .layer("core").definedBy("lotgate.sampling..")
                .layer("files").definedBy("lotgate.files..")
                .layer("plans").definedBy("lotgate.plan..", "lotgate.tables..")
                .layer("inspection").definedBy("lotgate.inspection..")
                .layer("sentencing").definedBy("lotgate.sentencing..")
                .layer("history").definedBy("lotgate.history..")
                .layer("reports").definedBy("lotgate.report")
                .layer("jobs").definedBy("lotgate.jobs..")
                .layer("renderings").definedBy("lotgate.report.results..")
                .layer("faces").definedBy("lotgate.cli..", "lotgate.web..")
                .whereLayer("faces").mayNotBeAccessedByAnyLayer()
                .whereLayer("renderings").mayOnlyBeAccessedByLayers("faces")
                .whereLayer("jobs").mayOnlyBeAccessedByLayers("renderings", "faces")
                .whereLayer("reports").mayOnlyBeAccessedByLayers("jobs", "renderings", "faces")
                .whereLayer("history").mayOnlyBeAccessedByLayers("reports", "jobs", "renderings", "faces")
                .whereLayer("sentencing").mayOnlyBeAccessedByLayers("history", "reports", "jobs", "renderings",
                        "faces")
                .whereLayer("inspection").mayOnlyBeAccessedByLayers("sentencing", "history", "reports", "jobs",
                        "renderings", "faces")
                .whereLayer("plans").mayOnlyBeAccessedByLayers("inspection", "sentencing", "history", "reports",
                        "jobs", "renderings", "faces")
                .whereLayer("files").mayOnlyBeAccessedByLayers("plans", "inspection", "sentencing", "history",
                        "reports", "jobs", "renderings", "faces")
                .check(classes);
    }

    @Test
    void theMathematicsImportsNothingOfOurs() {
        noClasses().that().resideInAPackage("lotgate.sampling..")
                .should().dependOnClassesThat(resideInAPackage("lotgate..").and(not(resideInAPackage("lotgate.sampling.."))))
                .because("sampling is the pure core: no files, sheets, store, reports, jobs or faces")
                .check(classes);
    }

    @Test
    void jobsKnowNoTerminalAndNoCommandLine() {
        noClasses().that().resideInAPackage("lotgate.jobs..")
                .should().dependOnClassesThat().resideInAnyPackage("picocli..", "lotgate.cli..", "lotgate.web..")
                .orShould().accessField(System.class, "out")
                .orShould().accessField(System.class, "err")
                .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.PrintWriter")
                .because("a job takes a request and returns a result; the faces print and exit")
                .check(classes);
    }
}
