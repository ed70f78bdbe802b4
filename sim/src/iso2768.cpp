// ISO 2768-1 general tolerances for linear and angular dimensions (references R9).
#include "swarf/sim/iso2768.h"

#include "swarf/sim/units.h"

#include <array>
#include <cmath>

namespace swarf {

namespace {

// Upper limits of the nominal-size bands, mm. A band runs "over" the previous limit "up to and
// including" its own; the first band starts at 0.5 mm.
// The first five bands (0.5 to 400 mm) are references R9. The bands 400-1000, 1000-2000 and
// 2000-4000 mm are from memory of the same standard's table.
constexpr std::array<double, 8> kLinearBandUpperMm{3, 6, 30, 120, 400, 1000, 2000, 4000};
constexpr double kLinearSmallestMm = 0.5;
constexpr double kNone = -1.0; // no general tolerance in that band

// ± mm by class (f, m, c, v) and band. Columns 0-4: references R9; columns 5-7: from memory.
constexpr std::array<std::array<double, 8>, 4> kLinearMm{{
    {0.05, 0.05, 0.1, 0.15, 0.2, 0.3, 0.5, kNone}, // f
    {0.1, 0.1, 0.2, 0.3, 0.5, 0.8, 1.2, 2.0},      // m
    {0.2, 0.3, 0.5, 0.8, 1.2, 2.0, 3.0, 4.0},      // c
    {kNone, 0.5, 1.0, 1.5, 2.5, 4.0, 6.0, 8.0},    // v
}};

// Upper limits of the shorter-leg bands for angles, mm; the last band is "over 400".
constexpr std::array<double, 4> kAngularBandUpperMm{10, 50, 120, 400};

// ± arc minutes by class and band (references R9).
constexpr std::array<std::array<double, 5>, 4> kAngularMin{{
    {60, 30, 20, 10, 5},   // f
    {60, 30, 20, 10, 5},   // m
    {90, 60, 30, 15, 10},  // c
    {180, 120, 60, 30, 20} // v
}};

int classIndex(Iso2768 cls) {
    switch (cls) {
    case Iso2768::f:
        return 0;
    case Iso2768::m:
        return 1;
    case Iso2768::c:
        return 2;
    case Iso2768::v:
        return 3;
    }
    return 1;
}

} // namespace

std::optional<double> iso2768LinearToleranceMm(Iso2768 cls, double nominalMm) {
    const double size = std::fabs(nominalMm);
    // Below 0.5 mm the standard gives no general tolerance: the drawing must state one.
    if (!(size >= kLinearSmallestMm))
        return std::nullopt;
    for (std::size_t band = 0; band < kLinearBandUpperMm.size(); ++band) {
        if (size <= kLinearBandUpperMm[band]) {
            const double tol = kLinearMm[classIndex(cls)][band];
            if (tol == kNone)
                return std::nullopt;
            return tol;
        }
    }
    return std::nullopt; // over 4000 mm
}

double iso2768AngularToleranceRad(Iso2768 cls, double shorterLegMm) {
    const double leg = std::fabs(shorterLegMm);
    std::size_t band = 0;
    while (band < kAngularBandUpperMm.size() && leg > kAngularBandUpperMm[band])
        ++band;
    return degToRad(kAngularMin[classIndex(cls)][band] / 60.0);
}

std::optional<Iso2768> parseIso2768(std::string_view letter) {
    if (letter.size() != 1)
        return std::nullopt;
    switch (letter[0]) {
    case 'f':
    case 'F':
        return Iso2768::f;
    case 'm':
    case 'M':
        return Iso2768::m;
    case 'c':
    case 'C':
        return Iso2768::c;
    case 'v':
    case 'V':
        return Iso2768::v;
    default:
        return std::nullopt;
    }
}

const char* iso2768Name(Iso2768 cls) {
    switch (cls) {
    case Iso2768::f:
        return "f";
    case Iso2768::m:
        return "m";
    case Iso2768::c:
        return "c";
    case Iso2768::v:
        return "v";
    }
    return "m";
}

} // namespace swarf
