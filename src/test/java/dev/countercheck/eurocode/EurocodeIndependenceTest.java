package dev.countercheck.eurocode;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

/** The formula library knows nothing of submissions, rulesets, reviews or reports. */
class EurocodeIndependenceTest {

    @Test
    void formulasDependOnNoOtherPackageOfTheProject() {
        JavaClasses classes = new ClassFileImporter()
                .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("dev.countercheck.eurocode");
        noClasses().that().resideInAPackage("dev.countercheck.eurocode")
                .should().dependOnClassesThat(
                        com.tngtech.archunit.base.DescribedPredicate.describe("are in another project package",
                                c -> c.getPackageName().startsWith("dev.countercheck")
                                        && !c.getPackageName().equals("dev.countercheck.eurocode")))
                .check(classes);
    }
}
