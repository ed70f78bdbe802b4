// Formatting lengths and angles for people.
#include "swarf/sim/units.h"

#include <cmath>
#include <cstdio>

namespace swarf {

int lengthDecimals(Units u, Precision p) {
    const bool inch = u == Units::Inch;
    switch (p) {
    case Precision::Normal:
        return inch ? 4 : 3;
    case Precision::Fine:
        return inch ? 5 : 4;
    case Precision::Finer:
        return inch ? 6 : 5;
    case Precision::Insert:
        return inch ? 5 : 2;
    }
    return 3;
}

std::string formatLength(double mm, Units u, int digits) {
    if (digits < 0)
        digits = lengthDecimals(u);
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.*f %s", digits, fromMm(mm, u), unitName(u));
    return buf;
}

std::string formatLength(double mm, Units u, Precision p) {
    return formatLength(mm, u, lengthDecimals(u, p));
}

std::string formatLengthNumber(double mm, Units u, Precision p) {
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.*f", lengthDecimals(u, p), fromMm(mm, u));
    return buf;
}

std::string formatSmallLength(double mm, Units u) {
    char buf[64];
    // The trade reads small inch lengths in thousandths ("thou").
    std::snprintf(buf, sizeof buf, u == Units::Inch ? "%.2f %s" : "%.1f %s", toSmallUnits(mm, u),
                  smallUnitName(u));
    return buf;
}

std::string formatRoughness(double um, Units u) {
    char buf[64];
    if (u == Units::Inch) // 1 µm = 39.37 µin
        std::snprintf(buf, sizeof buf, "%.0f µin (%.2f µm)", um * 1000.0 / 25.4, um);
    else
        std::snprintf(buf, sizeof buf, "%.2f µm", um);
    return buf;
}

std::string formatDms(double rad, int secondDecimals) {
    const bool neg = rad < 0;
    double deg = std::fabs(radToDeg(rad));
    const double scale = std::pow(10.0, secondDecimals);
    // Round to the shown precision first, so that 59.99″ does not print as 60.0″.
    double totalSec = std::round(deg * 3600.0 * scale) / scale;
    int d = static_cast<int>(totalSec / 3600.0);
    totalSec -= d * 3600.0;
    int m = static_cast<int>(totalSec / 60.0);
    double s = totalSec - m * 60.0;
    if (s < 0)
        s = 0;
    char buf[64];
    std::snprintf(buf, sizeof buf, "%s%d°%02d′%0*.*f″", neg ? "-" : "", d, m,
                  secondDecimals > 0 ? secondDecimals + 3 : 2, secondDecimals, s);
    return buf;
}

} // namespace swarf
