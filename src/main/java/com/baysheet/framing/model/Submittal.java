package com.baysheet.framing.model;

import com.baysheet.engine.InputError;

import java.time.Year;

/**
 * The project data a building department reads on a submittal: the site, the client, the engineer of record
 * with the licence number and the state (or province) that issued it, and the building code as the
 * jurisdiction adopted it, by name and edition year ("IBC", "2021"). Every field may be blank until known; a
 * licence needs the engineer it belongs to and the state that issued it, and an edition year needs its code.
 */
public record Submittal(String address, String client, String engineerOfRecord, String licenceNumber,
                        String licenceState, String buildingCode, String codeYear) {
    public static final Submittal NONE = new Submittal("", "", "", "", "", "", "");

    /** Earliest and latest edition years taken as plausible for a building code in force. */
    private static final int FIRST_YEAR = 1900, YEARS_AHEAD = 5;

    public Submittal {
        address = text("address", address, 400);
        client = text("client", client, 200);
        engineerOfRecord = text("engineerOfRecord", engineerOfRecord, 200);
        licenceNumber = text("licenceNumber", licenceNumber, 40);
        licenceState = text("licenceState", licenceState, 40);
        buildingCode = text("buildingCode", buildingCode, 80);
        codeYear = text("codeYear", codeYear, 4);
        if (!licenceNumber.isEmpty() && !licenceNumber.matches("[A-Za-z0-9][A-Za-z0-9 ./-]*"))
            throw new InputError("licenceNumber", licenceNumber, "may hold only letters, digits, spaces, dots, slashes and hyphens");
        if (!licenceNumber.isEmpty() && engineerOfRecord.isEmpty())
            throw new InputError("engineerOfRecord", "\"\"", "is required with a licence number: the licence is the engineer's");
        if (!licenceNumber.isEmpty() && licenceState.isEmpty())
            throw new InputError("licenceState", "\"\"", "is required with a licence number: name the state or province that issued it");
        if (!licenceState.isEmpty() && licenceNumber.isEmpty())
            throw new InputError("licenceNumber", "\"\"", "is required with a licence state");
        if (!codeYear.isEmpty()) {
            if (!codeYear.matches("\\d{4}")) throw new InputError("codeYear", codeYear, "must be the edition's year, four digits (2021)");
            int y = Integer.parseInt(codeYear), last = Year.now().getValue() + YEARS_AHEAD;
            if (y < FIRST_YEAR || y > last) throw new InputError("codeYear", codeYear, "must be between " + FIRST_YEAR + " and " + last);
            if (buildingCode.isEmpty()) throw new InputError("buildingCode", "\"\"", "is required with an edition year: name the code (IBC)");
        }
    }

    /** "IBC 2021 as adopted by the jurisdiction", or "" where no code is given. */
    public String adoptedCode() {
        if (buildingCode.isEmpty()) return "";
        return buildingCode + (codeYear.isEmpty() ? "" : " " + codeYear) + ", as adopted by the jurisdiction";
    }

    /** "J. Engineer, PE, licence CA 12345", "" where no engineer is named. */
    public String engineerLine() {
        if (engineerOfRecord.isEmpty()) return "";
        return engineerOfRecord + (licenceNumber.isEmpty() ? "" : ", licence " + licenceState + " " + licenceNumber);
    }

    private static String text(String field, String v, int max) {
        String s = v == null ? "" : v.strip();
        if (s.length() > max) throw new InputError(field, s.length() + " characters", "must be at most " + max + " characters");
        if (s.chars().anyMatch(Character::isISOControl)) throw new InputError(field, "a control character", "must be plain text on one line");
        return s;
    }
}
