#pragma once
// A result's headline figures as people read them, in the scene's units. Every place that shows
// them takes them from here: the terminal summary of `swarf run`, report.html, the window's
// panel and the pictures' labels, so they cannot disagree with each other or with result.json
// (which holds the same numbers in mm).
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

#include <string>
#include <vector>

namespace swarf {

/// One feature's figures.
struct FeatureFigures {
    std::string name;      ///< as the scene names it, or "feature N"
    bool within = false;   ///< its verdict
    std::string leftOn;    ///< the most metal left on, crests of the feed marks included
    std::string overcut;   ///< the most overcut
    std::string halfAngle; ///< cone or chamfer: the fitted half angle as cut (d°m′s″); else ""
    std::string drawnAngle; ///< cone or chamfer: the drawing's half angle; else ""
};

/// The figures of a whole result.
struct ResultFigures {
    bool within = false;      ///< the verdict
    std::string gaugePlane;   ///< z of the gauge plane
    std::string gaugeAsCut;   ///< the diameter as cut there (to 0.0001 mm / 0.00001 in)
    std::string gaugeDrawing; ///< the drawing's diameter there
    std::string gaugeError;   ///< as cut less drawing, signed, small units ("+0.5 µm")
    std::string leftOn;       ///< the most metal left on, normal to the surface, crests included
    std::string overcut;      ///< the most overcut, normal to the surface
    std::string rt, ra;       ///< the finishing pass's feed marks (formatRoughness)
    std::vector<FeatureFigures> features; ///< in the drawing's order
};

/// The figures of `result`, simulated from `scene`.
ResultFigures resultFigures(const Scene& scene, const CutResult& result);

} // namespace swarf
