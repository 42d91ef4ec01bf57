package dev.rootform.architecture;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.Architectures.layeredArchitecture;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

/**
 * The module and package structure of rootform, checked on the compiled main classes of every
 * module (this test lives in {@code cli}, the one module whose classpath holds all of them).
 *
 * <p>Modules form layers, {@code cli → api → export → numeric → symbolic}: a module may use any
 * module below it, never one above it. Packages form no cycles, neither between modules nor
 * between the subpackages of the project. The public signatures of the API module and of the
 * modules it exposes name no third-party type, and JAS is reached only through
 * {@code symbolic.backend}.
 */
@AnalyzeClasses(packages = "dev.rootform", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {
    private static final String CLI = "dev.rootform.cli..";
    private static final String API = "dev.rootform.api..";
    private static final String EXPORT = "dev.rootform.export..";
    private static final String NUMERIC = "dev.rootform.numeric..";
    private static final String SYMBOLIC = "dev.rootform.symbolic..";

    @ArchTest
    static final ArchRule modulesAreLayered = layeredArchitecture().consideringOnlyDependenciesInLayers()
            .layer("cli").definedBy(CLI)
            .layer("api").definedBy(API)
            .layer("export").definedBy(EXPORT)
            .layer("numeric").definedBy(NUMERIC)
            .layer("symbolic").definedBy(SYMBOLIC)
            .whereLayer("cli").mayNotBeAccessedByAnyLayer()
            .whereLayer("api").mayOnlyBeAccessedByLayers("cli")
            .whereLayer("export").mayOnlyBeAccessedByLayers("api", "cli")
            .whereLayer("numeric").mayOnlyBeAccessedByLayers("export", "api", "cli")
            .whereLayer("symbolic").mayOnlyBeAccessedByLayers("numeric", "export", "api", "cli")
            .because("data flows one way, from the command through the API down to the exact layer");

    @ArchTest
    static final ArchRule everyClassBelongsToAModule = classes().that().resideInAPackage("dev.rootform..")
            .should().resideInAnyPackage(CLI, API, EXPORT, NUMERIC, SYMBOLIC)
            .because("a class outside the known modules would escape the layering rule");

    @ArchTest
    static final ArchRule modulesAreFreeOfCycles = slices().matching("dev.rootform.(*)..").should().beFreeOfCycles();

    @ArchTest
    static final ArchRule packagesAreFreeOfCycles = slices().assignedFrom(new Subpackages()).should().beFreeOfCycles();

    /**
     * The API module, and the modules below it, whose public types the API hands out ({@code Report},
     * {@code Problem}, {@code ClosedForm} and what they expose): their public signatures name JDK
     * and rootform types only. The command ({@code cli}) is an application, not a library.
     */
    @ArchTest
    static final ArchRule librarySignaturesNameNoThirdPartyType = classes().that().resideInAnyPackage(API, EXPORT, NUMERIC, SYMBOLIC)
            .and(PublicSignatures.ARE_VISIBLE_OUTSIDE_THE_MODULE)
            .should(PublicSignatures.nameOnlyTypesFrom("java..", "dev.rootform.."))
            .because("library users must not depend on JAS, Symja, apfloat, Commons Math, Hipparchus, "
                    + "Jackson or picocli through the API");

    @ArchTest
    static final ArchRule onlyTheBackendUsesJas = noClasses().that().resideOutsideOfPackage("dev.rootform.symbolic.backend..")
            .should().dependOnClassesThat().resideInAPackage("edu.jas..")
            .because("JAS is converted to rootform's own types in one place");
}
