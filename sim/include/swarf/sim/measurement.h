#pragma once
// What a person measured on the part after a pass of the plan (MEASURED.toml, read by
// io::readMeasurements; scenes/MEASURED.md gives the file key by key). Plain values in mm and
// radians; z from the part's datum face toward the chuck, as in a scene.
#include "swarf/sim/error.h"

#include <string>
#include <vector>

namespace swarf {

/// A micrometer reading of the diameter at one plane.
struct DiameterReading {
    double zMm = 0;           ///< the plane, from the datum face
    double valueMm = 0;       ///< the diameter read
    double uncertaintyMm = 0; ///< standard uncertainty of the reading (> 0)
    SourceLoc where;
};

/// Readings over two equal rolls at one or more planes (references R6): the micrometer reads
/// M = D + d (1 + sec θ) where the cone's diameter at the rolls' centre plane is D.
struct RollsReading {
    double rollDiameterMm = 0;     ///< d
    std::vector<double> zMm;       ///< roll-centre planes, from the datum face
    std::vector<double> readingMm; ///< M at each plane
    double uncertaintyMm = 0;      ///< standard uncertainty of each reading (> 0)
    SourceLoc where;
};

/// A taper gauge (ring for a shank, plug for a socket) pushed home on the cone. Its own gauge
/// diameter then sits on the part at zMm = referenceZMm + standOffMm + gaugePlaneMm, where
/// standOffMm is what was measured from the part's reference face to the gauge's face.
struct GaugeReading {
    double gaugeDiameterMm = 0; ///< the gauge's own diameter at its gauge plane
    double gaugePlaneMm = 0;    ///< from the gauge's face to its gauge plane, toward the chuck
    double referenceZMm = 0;    ///< the part's reference face the stand-off is measured from
    double standOffMm = 0;      ///< from the reference face to the gauge's face, toward the chuck
    double uncertaintyMm = 0;   ///< standard uncertainty of the stand-off (> 0), a length
    SourceLoc where;

    /// Where the gauge's diameter sits on the part.
    double zMm() const { return referenceZMm + standOffMm + gaugePlaneMm; }
};

/// An indicator whose plunger stands square to the axis on the cone, run `travelMm` along a
/// line at `lineAngleRad` from the axis toward the cone's large end, rising away from the axis
/// (0: the saddle, along the axis; the compound's true angle: the compound). Its reading grows
/// as the surface comes toward it: change = L (cos α tan θ − sin α) (derived; references R10).
/// It gives the angle only.
struct IndicatorReading {
    double travelMm = 0;      ///< L, along the line of travel
    double lineAngleRad = 0;  ///< α
    double changeMm = 0;      ///< the change of reading over the travel
    double uncertaintyMm = 0; ///< standard uncertainty of the change (> 0)
    SourceLoc where;
};

/// Everything measured after one pass.
struct Measurements {
    std::string file;
    int afterPass = 0; ///< counting from 1
    std::vector<DiameterReading> diameters;
    std::vector<RollsReading> rolls;
    std::vector<GaugeReading> gauges;
    std::vector<IndicatorReading> indicators;
    SourceLoc where;
};

/// Common-practice standard uncertainties of the instruments when the file gives none (mm).
/// A micrometer reading to 0.001 mm (0.0001 in): 0.002 mm (0.0001 in in an inch file).
double defaultMicrometerUncertaintyMm(bool inch);
/// A micrometer over rolls, the rolls' own tolerance included: 0.003 mm (0.00015 in).
double defaultRollsUncertaintyMm(bool inch);
/// A depth gauge or caliper on a gauge's stand-off: 0.02 mm (0.001 in).
double defaultStandOffUncertaintyMm(bool inch);
/// A dial indicator read to half a division of 0.01 mm (0.0005 in): 0.005 mm (0.0003 in).
double defaultIndicatorUncertaintyMm(bool inch);

} // namespace swarf
