#pragma once
// Two results of the same job side by side: a scene and its twin (the mistake and its
// correction). The differences people are shown, in the viewer's panel (key w) and in the
// report of `swarf run --compare`, come from here, so the two cannot disagree.
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

#include <optional>
#include <string>

namespace swarf {

/// The main cone of one result: the first outside cone of the drawing (Part::mainCone) and its
/// report; empty when the drawing has no cone.
struct MainConeFigures {
    double halfAngleRad = 0;      ///< fitted half angle as cut
    double drawnHalfAngleRad = 0; ///< the drawing's half angle
    bool within = false;          ///< the cone's own verdict
};

/// The main cone's figures of `result` (simulated from `scene`), or nothing without a cone.
std::optional<MainConeFigures> mainConeFigures(const Scene& scene, const CutResult& result);

/// How a scene's result differs from its twin's: each "this" less "twin".
struct TwinDifference {
    double gaugeDiameterThisMm = 0, gaugeDiameterTwinMm = 0;
    double gaugeDiameterChangeMm = 0; ///< this less twin, at each scene's own gauge plane
    bool sameGaugePlane = true;       ///< the two gauge planes at the same z (to 1 nm)
    /// Main cones' fitted half angles, this less twin; empty unless both drawings have a cone.
    std::optional<double> halfAngleChangeRad;
    std::optional<MainConeFigures> coneThis, coneTwin;
    bool withinThis = false, withinTwin = false; ///< the verdicts
};

/// The difference of `result` (from `scene`) and `twinResult` (from `twin`). Pure; any two
/// results may be compared (a twin with another drawing only makes the numbers less telling,
/// and sameGaugePlane says when they are not taken at the same place).
TwinDifference twinDifference(const Scene& scene, const CutResult& result, const Scene& twin,
                              const CutResult& twinResult);

/// A signed change of diameter for people, in `units`' small lengths: "+40.0 µm", "−1.2 µm".
std::string formatDiameterChange(double mm, Units units);

/// A signed change of angle for people: "+0°00′01.2″", "−0°00′30.0″".
std::string formatAngleChange(double rad);

/// Lines for people (no trailing newline), in `scene`'s units: `heading`, then both gauge
/// diameters and their difference, both half angles and theirs, both verdicts; the two sides
/// called `thisWord` and `twinWord`.
std::string twinDifferenceText(const Scene& scene, const TwinDifference& d,
                               const std::string& heading, const std::string& thisWord = "this",
                               const std::string& twinWord = "twin");

} // namespace swarf
