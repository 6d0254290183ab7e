package dev.countercheck.submission;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

/** The submission model and its reader know no reviewers, rulesets, reports or commands (spec/architecture.md). */
class SubmissionDependenciesTest {

    @Test
    void submissionImportsNoReviewerRulesetReportOrCommand() {
        JavaClasses classes = new ClassFileImporter()
                .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("dev.countercheck.submission");

        noClasses().that().resideInAPackage("dev.countercheck.submission..")
                .should().dependOnClassesThat().resideInAnyPackage(
                        "dev.countercheck.review..", "dev.countercheck.ruleset..", "dev.countercheck.report..",
                        "dev.countercheck.element..", "dev.countercheck.cli..")
                .check(classes);
    }
}
