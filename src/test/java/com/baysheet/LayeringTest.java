package com.baysheet;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.lang.ArchRule;
import com.tngtech.archunit.lang.EvaluationResult;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

import java.util.List;
import java.util.stream.Stream;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * The table of DEVELOPERS.md ("The shape of the code"), checked on the compiled classes: each package depends
 * only on those to its left, and the pure packages import no web, SQL, PDF or template library.
 */
class LayeringTest {
    private static final String JAVALIN = "io.javalin..", SQL = "java.sql..", JDBC = "javax.sql..", PDF = "com.lowagie..",
            TEMPLATES = "org.thymeleaf..", MIGRATIONS = "org.flywaydb..", POOL = "com.zaxxer..";
    private static final String ENGINE = "com.baysheet.engine..", FRAMING = "com.baysheet.framing..",
            PROJECT = "com.baysheet.project..",
            SHEET = "com.baysheet.sheet..", REVIEW = "com.baysheet.review..", AUTH = "com.baysheet.auth..",
            NOTICE = "com.baysheet.notice..", STORE = "com.baysheet.store..", ISSUE = "com.baysheet.issue..", WEB = "com.baysheet.web..", CLI = "com.baysheet.cli..";

    /** One row of the table: the package and what it may not depend on. */
    record Layer(String pkg, String... forbidden) {
        ArchRule rule() {
            return noClasses().that().resideInAPackage(pkg).should().dependOnClassesThat().resideInAnyPackage(forbidden)
                    .because("DEVELOPERS.md: " + pkg + " depends only on the packages to its left");
        }
    }

    static final List<Layer> TABLE = List.of(
            new Layer(ENGINE, FRAMING, PROJECT, SHEET, REVIEW, AUTH, STORE, ISSUE, WEB, CLI, "com.baysheet", JAVALIN, SQL, JDBC, PDF, TEMPLATES, MIGRATIONS, POOL),
            new Layer(FRAMING, PROJECT, SHEET, REVIEW, AUTH, STORE, ISSUE, WEB, CLI, "com.baysheet", JAVALIN, SQL, JDBC, PDF, TEMPLATES, MIGRATIONS, POOL),
            new Layer(PROJECT, SHEET, REVIEW, AUTH, STORE, ISSUE, WEB, CLI, "com.baysheet", JAVALIN, SQL, JDBC, PDF, TEMPLATES, MIGRATIONS, POOL),
            new Layer(SHEET, PROJECT, REVIEW, AUTH, STORE, ISSUE, WEB, CLI, "com.baysheet", JAVALIN, SQL, JDBC, TEMPLATES, MIGRATIONS, POOL),
            new Layer(REVIEW, PROJECT, SHEET, STORE, ISSUE, WEB, CLI, "com.baysheet", JAVALIN, SQL, JDBC, PDF, TEMPLATES, MIGRATIONS, POOL),
            new Layer(AUTH, FRAMING, PROJECT, SHEET, REVIEW, STORE, ISSUE, WEB, CLI, "com.baysheet", JAVALIN, SQL, JDBC, PDF, TEMPLATES, MIGRATIONS, POOL),
            new Layer(NOTICE, FRAMING, PROJECT, SHEET, REVIEW, AUTH, STORE, ISSUE, WEB, CLI, "com.baysheet", JAVALIN, SQL, JDBC, PDF, TEMPLATES, MIGRATIONS, POOL),
            new Layer(STORE, SHEET, ISSUE, WEB, CLI, "com.baysheet", JAVALIN, PDF, TEMPLATES),
            new Layer(ISSUE, WEB, CLI, "com.baysheet", JAVALIN, SQL, JDBC, PDF, TEMPLATES, MIGRATIONS, POOL),
            new Layer(CLI, FRAMING, PROJECT, SHEET, REVIEW, AUTH, STORE, ISSUE, WEB, "com.baysheet", JAVALIN, SQL, JDBC, PDF, TEMPLATES),
            new Layer(WEB, CLI, "com.baysheet"));

    private static JavaClasses main;

    @BeforeAll
    static void importMain() {
        main = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS).importPackages("com.baysheet");
    }

    @TestFactory
    Stream<DynamicTest> everyPackageKeepsToItsRowOfTheTable() {
        return TABLE.stream().map(l -> DynamicTest.dynamicTest(l.pkg(), () -> l.rule().check(main)));
    }

    @Test
    void theTableCoversEveryPackageOfTheProgram() {
        List<String> covered = TABLE.stream().map(l -> l.pkg().replace("..", "")).toList();
        main.stream().map(c -> c.getPackageName()).filter(p -> p.startsWith("com.baysheet.")).distinct()
                .forEach(p -> assertThat(covered).as(p).anyMatch(top -> p.equals(top) || p.startsWith(top + ".")));
    }

    @Test
    void aPlantedBackImportFailsTheTable() {
        // a class of the test tree that sits in the engine and reaches up into the store (see layering/planted)
        JavaClasses planted = new ClassFileImporter().importClasses(com.baysheet.engine.planted.ReachesIntoTheStore.class);
        EvaluationResult r = TABLE.get(0).rule().evaluate(planted);
        assertThat(r.hasViolation()).isTrue();
        assertThat(r.getFailureReport().getDetails()).anyMatch(d -> d.contains("com.baysheet.store"));
    }

    @Test
    void aPlantedBackImportFromTheProjectModelFailsItsRow() {
        // the project model sits left of the store: a class of it that reaches into the store breaks its row
        JavaClasses planted = new ClassFileImporter().importClasses(com.baysheet.project.planted.ProjectReachesIntoTheStore.class);
        Layer project = TABLE.stream().filter(l -> l.pkg().equals(PROJECT)).findFirst().orElseThrow();
        EvaluationResult r = project.rule().evaluate(planted);
        assertThat(r.hasViolation()).isTrue();
        assertThat(r.getFailureReport().getDetails()).anyMatch(d -> d.contains("com.baysheet.store"));
    }
}
