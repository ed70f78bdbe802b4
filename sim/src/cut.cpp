// Small helpers of the kernel's result values (cut.h).
#include "swarf/sim/cut.h"

#include <algorithm>
#include <cmath>
#include <limits>

namespace swarf {

const char* verdictWords(bool withinTolerance) {
    return withinTolerance ? "within tolerance" : "out of tolerance";
}

const char* findingKindName(FindingKind kind) {
    switch (kind) {
    case FindingKind::LeftOn:
        return "left_on";
    case FindingKind::Overcut:
        return "overcut";
    case FindingKind::Rubbing:
        return "rubbing";
    case FindingKind::JawCrash:
        return "jaw_crash";
    case FindingKind::CrossesCentre:
        return "crosses_centre";
    case FindingKind::CompoundTravel:
        return "compound_travel";
    case FindingKind::DepthOfCut:
        return "depth_of_cut";
    case FindingKind::AirCut:
        return "air_cut";
    case FindingKind::CornerFillet:
        return "corner_fillet";
    case FindingKind::CoarseFinish:
        return "coarse_finish";
    case FindingKind::CutBetweenPasses:
        return "cut_between_passes";
    case FindingKind::BarRubsBore:
        return "bar_rubs_bore";
    case FindingKind::PastBoreBottom:
        return "past_bore_bottom";
    case FindingKind::LongOverhang:
        return "long_overhang";
    case FindingKind::BarTooBig:
        return "bar_too_big";
    }
    return "unknown";
}

const std::vector<FindingKind>& allFindingKinds() {
    static const std::vector<FindingKind> kinds = {
        FindingKind::LeftOn,         FindingKind::Overcut,          FindingKind::Rubbing,
        FindingKind::JawCrash,       FindingKind::CrossesCentre,    FindingKind::CompoundTravel,
        FindingKind::DepthOfCut,     FindingKind::AirCut,           FindingKind::CornerFillet,
        FindingKind::CoarseFinish,   FindingKind::CutBetweenPasses, FindingKind::BarRubsBore,
        FindingKind::PastBoreBottom, FindingKind::LongOverhang,     FindingKind::BarTooBig};
    return kinds;
}

std::optional<FindingKind> findingKindFromName(std::string_view name) {
    for (FindingKind k : allFindingKinds())
        if (name == findingKindName(k))
            return k;
    return std::nullopt;
}

const char* findingLabel(FindingKind kind) {
    switch (kind) {
    case FindingKind::LeftOn:
        return "metal left on";
    case FindingKind::Overcut:
        return "overcut";
    case FindingKind::Rubbing:
        return "rubbing";
    case FindingKind::JawCrash:
        return "tool reaches the jaws";
    case FindingKind::CrossesCentre:
        return "tool crosses the centre in metal";
    case FindingKind::CompoundTravel:
        return "compound travel";
    case FindingKind::DepthOfCut:
        return "depth of cut";
    case FindingKind::AirCut:
        return "cuts nothing";
    case FindingKind::CornerFillet:
        return "nose fillet in a corner";
    case FindingKind::CoarseFinish:
        return "coarse finishing feed";
    case FindingKind::CutBetweenPasses:
        return "cuts between passes";
    case FindingKind::BarRubsBore:
        return "boring bar rubs the bore";
    case FindingKind::PastBoreBottom:
        return "tool past the bottom of the hole";
    case FindingKind::LongOverhang:
        return "long boring-bar overhang";
    case FindingKind::BarTooBig:
        return "bar too big for the hole";
    }
    return "?";
}

double Profile::radiusAt(double zMm) const {
    if (radiusMm.empty())
        return std::numeric_limits<double>::quiet_NaN();
    if (radiusMm.size() == 1 || !(dzMm > 0))
        return radiusMm.front();
    const double t = (zMm - z0Mm) / dzMm;
    if (t <= 0)
        return radiusMm.front();
    const auto last = static_cast<double>(radiusMm.size() - 1);
    if (t >= last)
        return radiusMm.back();
    const auto i = static_cast<std::size_t>(std::floor(t));
    const double f = t - static_cast<double>(i);
    // On a sample, that sample: a NaN neighbour (the edge of the drawing) must not spread.
    if (f == 0)
        return radiusMm[i];
    return radiusMm[i] + f * (radiusMm[i + 1] - radiusMm[i]);
}

double Profile::volumeMm3() const {
    // Each interval a frustum; NaN samples (no solid) count as nothing.
    double v = 0;
    for (std::size_t i = 1; i < radiusMm.size(); ++i) {
        const double a = radiusMm[i - 1], b = radiusMm[i];
        if (std::isnan(a) || std::isnan(b))
            continue;
        v += a * a + a * b + b * b;
    }
    return kPi * dzMm / 3.0 * v;
}

} // namespace swarf
