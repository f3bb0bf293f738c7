package com.baysheet.sheet;

import com.baysheet.framing.Derived;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** The comparison of floor reduction methods in a package: only where the project chose another method. */
class MethodTablesTest {
    static final List<Revision> REVISIONS = List.of(new Revision("0", LocalDate.of(2025, 4, 1), "Issued for coordination", "JQR"));

    @Test
    void aProjectOnItsEditionsReductionKeepsItsPackageAsItWas() {
        CalcPackage p = FramingSheets.level(SheetFixtures.header("Level 2"), SheetFixtures.building(), "Level 2", REVISIONS);
        assertThat(p.methodTables()).isEmpty();
        assertThat(SheetFixtures.squash(SheetFixtures.text(PackageRenderer.render(p).bytes()))).doesNotContain("reductionmethodscompared");
    }

    @Test
    void aProjectOnAnotherMethodPrintsEachLevelUnderEveryMethod() {
        Derived d = SheetFixtures.building(SheetFixtures.US.withFloorMethod("ibc-2021-alternative"));
        CalcPackage p = FramingSheets.level(SheetFixtures.header("Level 2"), d, "Level 2", REVISIONS);
        assertThat(p.methodTables()).hasSize(1);
        TakeDownTable t = p.methodTables().get(0);
        // the project's own method first, then the edition's own and the other IBC editions
        assertThat(t.headings().get(3)).isEqualTo("f, IBC 2021 alternative uniform live load reduction (project's)");
        assertThat(t.headings()).anyMatch(h -> h.startsWith("f, ASCE 7-16 basic"));
        long members = d.onLevel("Level 2").stream().filter(m -> !m.result().methods().isEmpty()).count();
        assertThat(t.rows()).hasSize((int) members);
        String text = SheetFixtures.squash(SheetFixtures.text(PackageRenderer.render(p).bytes()));
        assertThat(text).contains("Floorliveloadreductionmethodscompared,Level2").contains("IBC20211607.12.2")
                .contains("mustbecheckedbyalicensedengineer");
        // the take-down table leaves K_LL and the influence area blank under the chosen method
        assertThat(p.takeDowns().get(0).rows().get(0).get(5)).isEqualTo("—");
    }
}
