#pragma once
// Internal to the executable: the options of `swarf taper`, read as text, and what they ask for,
// resolved and checked. Every bad value is refused here (InputError, exit 2), before a line of
// the answer is printed.
#include "swarf/sim/cone.h"
#include "swarf/sim/nose_offset.h"
#include "swarf/sim/sine_bar.h"
#include "swarf/sim/taper_methods.h"
#include "swarf/sim/units.h"

#include <optional>
#include <string>
#include <utility>

namespace swarf::app {

/// The options as typed: every one is read as text, so that a bad value gets our own message.
struct TaperOptions {
    std::string units = "mm";
    std::string standard, dia, halfAngle, included, ratio, perFoot, rate, dia2, length;
    std::string gaugeEnd = "large", widens = "chuck", tipSide = "chuck";
    std::string at, toDia;
    std::string noseRadius, feed, workLength, rolls, rollStacks, tipHeight, blocks;
    std::string compoundTravel, guideBarLength, guideBarMaxAngle, maxSetOver;
};

/// What the options ask for, in mm and radians.
struct TaperRequest {
    Units u = Units::Mm;
    std::string source; ///< how the cone was given, for the heading
    std::string note;   ///< a standard's note
    double gaugeDiaMm = 0;
    double halfAngleRad = 0;
    bool gaugeAtLarge = true;       ///< the gauge diameter is at the cone's large end
    std::optional<double> lengthMm; ///< from the gauge plane to the cone's other end
    Widens widens = Widens::TowardChuck;
    std::optional<double> atMm;    ///< --at: signed distance from the gauge plane
    std::optional<double> toDiaMm; ///< --to-dia
    std::optional<double> noseRadiusMm, feedMmPerRev, tipHeightMm, workLengthMm, rollDiameterMm;
    std::optional<std::pair<double, double>> rollStacksMm; ///< --roll-stacks H1,H2
    TipSide tipSide = TipSide::ChuckSide;
    std::optional<GaugeBlockSet> blocks; ///< --blocks (replaces the common sets)
    TaperMethodLimits limits;

    /// Diameter at the large and the small end (the gauge diameter where there is no length).
    double largeMm() const;
    double smallMm() const;
};

/// Resolves and checks the options. Throws InputError (option, value, what was expected).
TaperRequest readTaperOptions(const TaperOptions& options);

/// The bench figures for a request, as the text `swarf taper` prints.
std::string taperFiguresText(const TaperRequest& request);

} // namespace swarf::app
