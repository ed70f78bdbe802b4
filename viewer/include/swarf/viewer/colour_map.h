#pragma once
// The deviation colours: a perceptually uniform diverging map centred on zero, and the scale
// that maps a deviation in mm onto it (the same for every moment of one result, so colours can
// be compared pass to pass).
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

#include <string>

namespace swarf::viewer {

/// A colour, each channel 0..1.
struct Rgb {
    double r = 0, g = 0, b = 0;
};

/// The cool-warm diverging map at t in [0, 1] (clamped): 0 blue, 0.5 neutral grey, 1 red.
Rgb coolWarm(double t);

/// How deviations are coloured and labelled.
struct DeviationScale {
    double limitMm = 0.1;    ///< deviations of ±limit reach the ends of the map, mm (> 0)
    double bandMm = 0.01;    ///< the tolerance band, ± this normal to the surface, mm (> 0)
    Units units = Units::Mm; ///< µm for mm scenes, thou for inch scenes
    /// A deviation in mm in display units (µm or thou).
    double toDisplay(double mm) const;
    /// "µm" or "thou".
    const char* displayUnit() const;
    /// Position on the map, 0..1 (0.5 for zero; clamped).
    double mapPosition(double deviationMm) const;
};

/// Bands either side of zero the colour map spans; beyond, colours saturate.
inline constexpr double kScaleBands = 2.0;

/// The scale for a result: the band is the main cone's tolerance (± on diameter, so half of it
/// on radius, taken normal to the surface); the limit is kScaleBands bands, fixed by the drawing
/// alone, so one colour means one deviation in every picture (the result does not move it).
DeviationScale deviationScale(const Scene& scene, const CutResult& result);

/// Colour of a deviation (mm): + left on is warm (red), − overcut is cool (blue).
Rgb deviationColour(double deviationMm, const DeviationScale& scale);

} // namespace swarf::viewer
