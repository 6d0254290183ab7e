package dev.countercheck;

import com.tngtech.archunit.base.DescribedPredicate;
import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

import static com.tngtech.archunit.base.DescribedPredicate.not;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAPackage;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.simpleName;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

/** The dependency rules of spec/architecture.md, so that they hold as the code grows. */
class ArchitectureTest {

    private static final JavaClasses CLASSES = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("dev.countercheck");

    @Test
    void theFormulaLibraryDependsOnNoOtherPackageOfTheProject() {
        noClasses().that().resideInAPackage("dev.countercheck.eurocode")
                .should().dependOnClassesThat(DescribedPredicate.describe("are in another project package",
                        c -> c.getPackageName().startsWith("dev.countercheck")
                                && !c.getPackageName().equals("dev.countercheck.eurocode")))
                .check(CLASSES);
    }

    @Test
    void staticsIsPureAndUsesOnlyTheFormulaLibrary() {
        noClasses().that().resideInAPackage("dev.countercheck.statics")
                .should().dependOnClassesThat(DescribedPredicate.describe("are in a project package other than eurocode",
                        c -> c.getPackageName().startsWith("dev.countercheck")
                                && !c.getPackageName().equals("dev.countercheck.statics")
                                && !c.getPackageName().equals("dev.countercheck.eurocode")))
                .check(CLASSES);
    }

    @Test
    void combinationsArePureAndUseOnlyTheFormulaLibrary() {
        noClasses().that().resideInAPackage("dev.countercheck.actions")
                .should().dependOnClassesThat(DescribedPredicate.describe("are in a project package other than eurocode",
                        c -> c.getPackageName().startsWith("dev.countercheck")
                                && !c.getPackageName().equals("dev.countercheck.actions")
                                && !c.getPackageName().equals("dev.countercheck.eurocode")))
                .check(CLASSES);
    }

    @Test
    void onlyTheListOfKindsNamesAnElementKind() {
        noClasses().that().resideOutsideOfPackages("dev.countercheck.element.pilecap..")
                .and().doNotHaveFullyQualifiedName("dev.countercheck.element.ElementKinds")
                .should().dependOnClassesThat().resideInAPackage("dev.countercheck.element.pilecap..")
                .check(CLASSES);
    }

    @Test
    void submissionsKnowNoReviewersRulesetsReportsOrCommands() {
        noClasses().that().resideInAPackage("dev.countercheck.submission..")
                .should().dependOnClassesThat().resideInAnyPackage("dev.countercheck.review..",
                        "dev.countercheck.ruleset..", "dev.countercheck.report..", "dev.countercheck.element..",
                        "dev.countercheck.cli..")
                .check(CLASSES);
    }

    @Test
    void reviewAndElementsNeverImportReportOrCli() {
        noClasses().that().resideInAnyPackage("dev.countercheck.review..", "dev.countercheck.element..")
                .should().dependOnClassesThat().resideInAnyPackage("dev.countercheck.report..", "dev.countercheck.cli..")
                .check(CLASSES);
    }

    @Test
    void nothingImportsTheCommandLine() {
        noClasses().that().resideOutsideOfPackage("dev.countercheck.cli..")
                .should().dependOnClassesThat().resideInAPackage("dev.countercheck.cli..")
                .check(CLASSES);
    }

    @Test
    void reportRendersAFinishedReviewAndComputesNothing() {
        DescribedPredicate<JavaClass> formulas = resideInAPackage("dev.countercheck.eurocode..")
                .and(not(simpleName("Step").or(simpleName("Num"))));
        noClasses().that().resideInAPackage("dev.countercheck.report..")
                .should().dependOnClassesThat().resideInAnyPackage("dev.countercheck.element..",
                        "dev.countercheck.ruleset..", "dev.countercheck.statics..")
                .orShould().dependOnClassesThat(formulas)
                .orShould().dependOnClassesThat().haveSimpleName("ClaimComparer")
                .check(CLASSES);
    }

    @Test
    void rulesetsKnowNoSubmissionsReviewsOrReports() {
        noClasses().that().resideInAPackage("dev.countercheck.ruleset..")
                .should().dependOnClassesThat().resideInAnyPackage("dev.countercheck.submission..",
                        "dev.countercheck.review..", "dev.countercheck.element..", "dev.countercheck.report..")
                .check(CLASSES);
    }

    @Test
    void theReviewRoundPackagesNeverImportReportCliOrReviewers() {
        noClasses().that().resideInAnyPackage("dev.countercheck.responses..", "dev.countercheck.revision..",
                        "dev.countercheck.round..", "dev.countercheck.export..")
                .should().dependOnClassesThat().resideInAnyPackage("dev.countercheck.report..",
                        "dev.countercheck.cli..", "dev.countercheck.element..", "dev.countercheck.ruleset..")
                .check(CLASSES);
    }
}
