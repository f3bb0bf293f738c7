package com.baysheet.review;

import com.baysheet.engine.InputError;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** Which mark sheets a search admits: mark, role, and the words left over all in one location. */
class SheetSearchTest {
    private static final List<MarkSheets.MarkSheet> SHEETS = MarkSheets.fresh(PackageManifestTest.building(60)).all();

    private static List<MarkSheets.MarkSheet> found(String typed) {
        SheetSearch s = SheetSearch.of(typed);
        return SHEETS.stream().filter(s::admits).toList();
    }

    @Test
    void blankAdmitsEverySheet() {
        assertThat(found("  ")).hasSameSizeAs(SHEETS);
        assertThat(SheetSearch.of(null).isEmpty()).isTrue();
    }

    @Test
    void aMarkIsFoundInAnyCase() {
        MarkSheets.MarkSheet first = SHEETS.get(0);
        assertThat(found(first.text().toLowerCase())).contains(first)
                .allMatch(s -> s.text().toLowerCase().contains(first.text().toLowerCase())
                        || s.group().role().name().replace('_', ' ').toLowerCase().contains(first.text().toLowerCase())
                        || s.group().locations().stream().anyMatch(l -> l.toLowerCase().contains(first.text().toLowerCase())));
    }

    @Test
    void theWordsLeftOverMustAllBeInOneLocation() {
        MarkSheets.MarkSheet s = SHEETS.get(SHEETS.size() - 1);
        String location = s.group().locations().get(0);
        String level = location.substring(0, location.indexOf(':'));
        String place = location.substring(location.indexOf(':') + 1).strip();
        List<MarkSheets.MarkSheet> hits = found("\"" + level + "\" \"" + place + "\"");
        assertThat(hits).contains(s)
                .allMatch(x -> x.group().locations().stream().anyMatch(l -> l.contains(level) && l.contains(place)));
        assertThat(found("\"" + level + "\" nowhere-at-all")).isEmpty();
    }

    @Test
    void aRoleWordFindsItsMembers() {
        assertThat(found("column")).isNotEmpty().allMatch(x -> x.group().role() == com.baysheet.framing.MemberRole.COLUMN
                || x.group().locations().stream().anyMatch(l -> l.toLowerCase().contains("column")));
    }

    @Test
    void aPhraseInQuotesIsOneWord() {
        assertThat(SheetSearch.of("\"Level  2\" A/1-2 a/1-2").words()).containsExactly("level 2", "a/1-2");
    }

    @Test
    void anOverlongSearchIsRefusedNamingTheField() {
        assertThatThrownBy(() -> SheetSearch.of("x".repeat(SheetSearch.MAX_LENGTH + 1))).isInstanceOf(InputError.class)
                .hasMessageContaining("q");
    }
}
