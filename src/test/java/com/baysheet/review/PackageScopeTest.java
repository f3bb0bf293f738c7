package com.baysheet.review;

import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

class PackageScopeTest {
    @Test
    void theProjectAndALevelHaveReadableSubjects() {
        assertThat(PackageScope.PROJECT.subject()).isEqualTo("package-project");
        assertThat(PackageScope.PROJECT.title()).isEqualTo("Project package");
        assertThat(PackageScope.ofLevel("Level 2").subject()).isEqualTo("package-level-Level-2");
        assertThat(PackageScope.ofLevel("Level 2").title()).isEqualTo("Level 2 package");
        assertThat(new SheetRef(1, PackageScope.ofLevel("Roof").subject()).isPackage()).isTrue();
    }

    @Test
    void namesThatLookAlikeGetDifferentKeys() {
        List<String> names = List.of("Level 2", "Level-2", "Level_2", "level 2", "Level  2", "project", "Niveau 2é", "Niveau 2e",
                "Level 2/3", "Level 2_2f3");
        Set<String> keys = names.stream().map(n -> PackageScope.ofLevel(n).key()).collect(Collectors.toSet());
        assertThat(keys).hasSize(names.size()).doesNotContain(PackageScope.PROJECT.key());
        assertThat(keys).allSatisfy(k -> assertThat(k).matches("[A-Za-z0-9_-]+"));
    }

    @Test
    void aLongNameStillFitsTheStoreAndStaysDistinct() {
        String a = "Ébène ".repeat(10).strip(), b = "Ébène ".repeat(9) + "Ébènf";
        String ka = PackageScope.ofLevel(a).subject(), kb = PackageScope.ofLevel(b).subject();
        assertThat(ka.length()).isLessThanOrEqualTo(120);
        assertThat(kb.length()).isLessThanOrEqualTo(120);
        assertThat(ka).isNotEqualTo(kb).matches("[A-Za-z0-9_-]+");
    }

    @Test
    void everyLevelOfTheModelHasAPackageAfterTheProjectsTopDown() {
        var d = PackageManifestTest.building(65);
        assertThat(PackageScope.all(d)).containsExactly(PackageScope.PROJECT, PackageScope.ofLevel("Roof"),
                PackageScope.ofLevel("Level 2"));
        assertThat(PackageScope.find(d, "level-Roof")).contains(PackageScope.ofLevel("Roof"));
        assertThat(PackageScope.find(d, "level-Level-9")).isEmpty();
        assertThat(PackageScope.ofSubject(d, "package-project")).contains(PackageScope.PROJECT);
        assertThat(PackageScope.ofSubject(d, d.members().get(0).id())).isEmpty();
    }

    @Test
    void aLevelPackageNamesItsLevel() {
        assertThatThrownBy(() -> PackageScope.ofLevel(" ")).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("level");
    }
}
