// ISO 1832 and ISO 5608 letters (references R8) and insert geometry limits (derived).
#include "swarf/io/insert_codes.h"

#include <algorithm>
#include <cctype>
#include <cmath>
#include <numbers>

namespace swarf::io {

std::optional<double> shapeIncludedAngleDeg(char letter) {
    switch (std::toupper(static_cast<unsigned char>(letter))) {
    case 'C':
        return 80.0;
    case 'D':
        return 55.0;
    case 'E':
        return 75.0;
    case 'K':
        return 55.0;
    case 'S':
        return 90.0;
    case 'T':
        return 60.0;
    case 'V':
        return 35.0;
    case 'W':
        return 80.0;
    case 'R':
        return 180.0;
    default:
        return std::nullopt;
    }
}

std::optional<double> holderEnteringAngleDeg(char letter) {
    switch (std::toupper(static_cast<unsigned char>(letter))) {
    case 'A':
        return 90.0;
    case 'B':
        return 75.0;
    case 'D':
        return 45.0;
    case 'E':
        return 60.0;
    case 'F':
        return 90.0;
    case 'G':
        return 90.0;
    case 'J':
        return 93.0;
    case 'K':
        return 75.0;
    case 'L':
        return 95.0;
    case 'N':
        return 63.0;
    case 'S':
        return 45.0;
    case 'T':
        return 60.0;
    case 'Y':
        return 85.0;
    case 'H':
        return 107.5;
    case 'Q':
        return 107.5;
    case 'P':
        return 117.5;
    case 'V':
        return 72.5;
    default:
        return std::nullopt;
    }
}

std::optional<InsertCode> parseInsertCode(std::string_view code) {
    std::string s;
    for (char c : code)
        if (c != ' ' && c != '-')
            s += static_cast<char>(std::toupper(static_cast<unsigned char>(c)));
    if (s.size() < 10)
        return std::nullopt;
    for (int i = 0; i < 4; ++i)
        if (!std::isalpha(static_cast<unsigned char>(s[i])))
            return std::nullopt;
    if (!shapeIncludedAngleDeg(s[0]))
        return std::nullopt;
    auto digit = [](char c) { return std::isdigit(static_cast<unsigned char>(c)) != 0; };
    InsertCode out;
    out.shape = s[0];
    out.toleranceClass = s[2];
    // Size: two digits, whole mm of the edge length (for round inserts, the diameter): the
    // edge itself follows from the inscribed circle the code stands for.
    if (!digit(s[4]) || !digit(s[5]))
        return std::nullopt;
    const int size = (s[4] - '0') * 10 + (s[5] - '0');
    out.edgeLengthMm = size;
    if (const auto ic = inscribedCircleOfSizeCodeMm(out.shape, size)) {
        out.inscribedCircleMm = *ic;
        out.edgeLengthMm = *edgeLengthFromInscribedCircleMm(out.shape, *ic);
    } else if (out.shape != 'K') {
        return std::nullopt; // no insert of this shape has that size
    }
    // Thickness: "T3" is 3.97 mm, "03" 3.18 mm and so on (nominal inch fractions).
    const std::string t = s.substr(6, 2);
    if (t == "01")
        out.thicknessMm = 1.59;
    else if (t == "T1")
        out.thicknessMm = 1.98;
    else if (t == "02")
        out.thicknessMm = 2.38;
    else if (t == "T2")
        out.thicknessMm = 2.78;
    else if (t == "03")
        out.thicknessMm = 3.18;
    else if (t == "T3")
        out.thicknessMm = 3.97;
    else if (t == "04")
        out.thicknessMm = 4.76;
    else if (t == "05")
        out.thicknessMm = 5.56;
    else if (t == "06")
        out.thicknessMm = 6.35;
    else if (t == "07")
        out.thicknessMm = 7.94;
    else if (t == "09")
        out.thicknessMm = 9.52;
    else
        return std::nullopt;
    // Corner radius: two digits in tenths of a mm; "M0" marks a round insert.
    const std::string r = s.substr(8, 2);
    if (r == "M0") {
        if (out.shape != 'R')
            return std::nullopt;
        out.noseRadiusMm = out.edgeLengthMm / 2.0;
    } else if (digit(r[0]) && digit(r[1])) {
        out.noseRadiusMm = ((r[0] - '0') * 10 + (r[1] - '0')) / 10.0;
    } else {
        return std::nullopt;
    }
    return out;
}

namespace {

double cotDeg(double deg) {
    return 1.0 / std::tan(deg * std::numbers::pi / 180.0);
}

} // namespace

const std::vector<double>& standardInscribedCirclesMm() {
    // The inch series (5/32, 3/16, 7/32, 1/4, 5/16, 3/8, 1/2, 5/8, 3/4, 1, 1¼ in) and the
    // metric diameters of round inserts.
    static const std::vector<double> ic = {3.97,  4.76, 5.56, 6.0,   6.35,   7.94, 8.0,
                                           9.525, 10.0, 12.0, 12.7,  15.875, 16.0, 19.05,
                                           20.0,  25.0, 25.4, 31.75, 32.0};
    return ic;
}

std::optional<double> edgeLengthFromInscribedCircleMm(char shape, double icMm) {
    const double rho = icMm / 2;
    switch (std::toupper(static_cast<unsigned char>(shape))) {
    case 'C': // rhombus of corner ε: ρ (cot(ε/2) + tan(ε/2)) = IC / sin ε
        return icMm / std::sin(80 * std::numbers::pi / 180);
    case 'D':
        return icMm / std::sin(55 * std::numbers::pi / 180);
    case 'E':
        return icMm / std::sin(75 * std::numbers::pi / 180);
    case 'M':
        return icMm / std::sin(86 * std::numbers::pi / 180);
    case 'V':
        return icMm / std::sin(35 * std::numbers::pi / 180);
    case 'S':
        return icMm;
    case 'T':
        return 2 * rho * cotDeg(30);
    case 'W': // corners of 80° and 160° in turn
        return rho * (cotDeg(40) + cotDeg(80));
    case 'P':
        return 2 * rho * cotDeg(54);
    case 'H':
        return 2 * rho * cotDeg(60);
    case 'O':
        return 2 * rho * cotDeg(67.5);
    case 'R':
        return icMm;
    default:
        return std::nullopt;
    }
}

std::optional<double> iso1832CornerToleranceMm(char classLetter, double inscribedCircleMm) {
    // From memory (see the header): the m tolerances of the classes; M, N and U grow with the
    // inscribed circle.
    const double ic = inscribedCircleMm - 1e-6; // 12.7 itself is in the step up to 12.7
    const int step = ic <= 9.525 ? 0 : ic <= 12.7 ? 1 : ic <= 19.05 ? 2 : 3;
    switch (std::toupper(static_cast<unsigned char>(classLetter))) {
    case 'A':
    case 'F':
    case 'J':
        return 0.005;
    case 'C':
    case 'H':
    case 'K':
        return 0.013;
    case 'E':
    case 'G':
    case 'L':
        return 0.025;
    case 'M':
    case 'N': {
        static const double mn[] = {0.08, 0.13, 0.15, 0.18};
        return mn[step];
    }
    case 'U': {
        static const double u[] = {0.13, 0.2, 0.27, 0.38};
        return u[step];
    }
    default:
        return std::nullopt;
    }
}

std::optional<double> inscribedCircleOfSizeCodeMm(char shape, int sizeCode) {
    const bool round = std::toupper(static_cast<unsigned char>(shape)) == 'R';
    const std::vector<double>& ics = standardInscribedCirclesMm();
    if (round)
        for (double ic : ics)
            if (ic == sizeCode)
                return ic;
    for (double ic : ics) {
        const auto edge = edgeLengthFromInscribedCircleMm(shape, ic);
        // The inch series (whole 32nds of an inch) for shapes with corners; the metric circles
        // are round inserts'.
        const double n32 = ic * 32 / 25.4;
        const bool inch = std::abs(n32 - std::round(n32)) < 0.02;
        // The edge to 0.1 mm, as the tables give it (6.35 · √3 = 10.998 is 11.0: code 11),
        // then its whole millimetres.
        if (edge && (round || inch) &&
            static_cast<int>(std::floor(std::round(*edge * 10) / 10 + 1e-9)) == sizeCode)
            return ic;
    }
    return std::nullopt;
}

double inscribedCircleMm(char shape, double includedRad, double edgeLengthMm) {
    switch (std::toupper(static_cast<unsigned char>(shape))) {
    case 'R':
        return edgeLengthMm;
    case 'T':
        return edgeLengthMm / std::sqrt(3.0);
    case 'W':
        return 2.0 * edgeLengthMm / (cotDeg(40) + cotDeg(80));
    default:
        if (includedRad >= std::numbers::pi)
            return edgeLengthMm;
        // Rhombus or square, also for an insert given by its included angle alone.
        return edgeLengthMm * std::sin(includedRad);
    }
}

double maxNoseRadiusMm(char shape, double includedRad, double edgeLengthMm) {
    const double ic = inscribedCircleMm(shape, includedRad, edgeLengthMm);
    if (std::toupper(static_cast<unsigned char>(shape)) == 'R' || includedRad >= std::numbers::pi)
        return ic / 2.0;
    return std::min(ic / 2.0, edgeLengthMm * std::tan(includedRad / 2.0));
}

} // namespace swarf::io
