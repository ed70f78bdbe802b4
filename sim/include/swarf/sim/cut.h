#pragma once
// What the kernel makes of a scene: tool moves, the exact as-cut profile, the 3D surface with
// feed marks, the comparison with the drawing, and findings. Plain values; mm and radians.
#include "swarf/sim/causes.h"
#include "swarf/sim/feed_marks.h"
#include "swarf/sim/scene.h"

#include <Eigen/Core>
#include <limits>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace swarf {

/// One straight move of the tool, as the machine model makes it from the dial readings.
struct ToolMove {
    int pass = -1;                 ///< index into Scene::plan.passes
    Eigen::Vector2d tipFrom{0, 0}; ///< imaginary tip (z, x) at the start, mm
    Eigen::Vector2d tipTo{0, 0};   ///< imaginary tip (z, x) at the end, mm
    double feedMmPerRev = 0.1;
    /// Dial readings (mm of dial) at the start and end, for display.
    double crossFrom = 0, crossTo = 0, compoundFrom = 0, compoundTo = 0, saddleFrom = 0,
           saddleTo = 0;
};

/// What a move between two passes does: the tool going back from one pass's end to the next
/// pass's start (scenes/README.md, "Between passes"). None of them should cut.
enum class ReturnStep {
    BackOut,  ///< the cross-slide backed out, reading decreasing
    WindBack, ///< a slide wound back past the reading it is set to next (approach = take_up)
    BringUp,  ///< a slide brought forward, reading increasing, to its next reading
    Dial,     ///< a slide dialled straight to its next reading (approach = in_order)
    FeedIn,   ///< the cross-slide fed in to the next pass's reading
};

/// The three handwheel slides.
enum class SlideName { Cross, Compound, Saddle };

/// One move of the tool between two passes, as the machine model makes it.
struct BetweenMove {
    int afterPass = -1;  ///< the pass just ended (−1: the tool comes to the first pass)
    int beforePass = -1; ///< the pass it leads to (−1: the last back-out, after the last pass)
    ReturnStep step = ReturnStep::BackOut;
    SlideName slide = SlideName::Cross;
    /// The tip and all three readings at its ends; feed 0; `pass` is beforePass, or afterPass
    /// for the last back-out.
    ToolMove move;
    double cutsMm = 0; ///< radius of metal it would cut (0: none); filled by the kernel's check
};

/// A radius sampled along the axis: radiusMm[i] at z = z0Mm + i·dzMm.
struct Profile {
    double z0Mm = 0;
    double dzMm = 0.002;
    std::vector<double> radiusMm;

    double zAt(std::size_t i) const { return z0Mm + static_cast<double>(i) * dzMm; }
    /// Radius at z, mm: linear between samples, the sample itself on one (so a NaN neighbour,
    /// the edge of the drawing, does not spread), clamped outside; NaN if there are no samples.
    double radiusAt(double zMm) const;
    /// Volume of the solid of revolution, mm³ (each interval taken as a frustum).
    double volumeMm3() const;
};

/// Kinds of finding about the cut. These are results, not errors.
enum class FindingKind {
    LeftOn,           ///< metal left on after the last pass, beyond tolerance
    Overcut,          ///< cut below the drawing, beyond tolerance: scrap
    Rubbing,          ///< trailing edge or flank rubs: the cone is steeper than the tool can follow
    JawCrash,         ///< the tool reaches the chuck jaws
    CrossesCentre,    ///< the tool crosses the spindle axis where there is metal
    CompoundTravel,   ///< a compound reading beyond its travel
    DepthOfCut,       ///< depth of cut beyond the cutting edge length
    AirCut,           ///< the pass cuts nothing
    CornerFillet,     ///< the nose leaves a fillet in an internal corner the drawing has sharp
    CoarseFinish,     ///< the finishing feed is more than a nose radius finishes well (f > r/2)
    CutBetweenPasses, ///< a move between passes (back-out, wind-back, feed-in) cuts metal
    BarRubsBore,      ///< a boring bar's shank (behind the insert) touches the bore wall
    PastBoreBottom,   ///< a boring tool runs past the bottom of a blind hole
    LongOverhang,     ///< a boring bar overhangs more than about 4 bar diameters (steel bar)
    BarTooBig,        ///< the boring bar does not enter the hole as it stands (min_bore larger)
};

/// Every finding kind, in the order above.
const std::vector<FindingKind>& allFindingKinds();

/// The verdict as people read it, the same on every screen, sheet and report: "within
/// tolerance" or "out of tolerance" (result.json keeps the keys in_tolerance and
/// out_of_tolerance).
const char* verdictWords(bool withinTolerance);

/// "left_on", "overcut", ... as written in result.json.
const char* findingKindName(FindingKind kind);

/// The kind named `name` as result.json spells it ("left_on", ...); empty if none is.
std::optional<FindingKind> findingKindFromName(std::string_view name);

/// The finding's kind for people: "metal left on", "tool reaches the jaws", ...
const char* findingLabel(FindingKind kind);

/// One finding, tied to the pass that caused it (−1 if none). Each figure has its own unit; a
/// figure the finding does not have is NaN.
struct Finding {
    FindingKind kind = FindingKind::LeftOn;
    int pass = -1;
    std::string message;
    double zMm = std::numeric_limits<double>::quiet_NaN();      ///< where along the axis, mm
    double valueMm = std::numeric_limits<double>::quiet_NaN();  ///< its size as a length, mm
    double angleRad = std::numeric_limits<double>::quiet_NaN(); ///< its size as an angle, rad
};

/// The as-cut part against one feature of the drawing.
struct FeatureReport {
    int feature = -1;       ///< index into Scene::part.features
    double maxLeftOnMm = 0; ///< largest metal left on, normal to the surface, crests included (≥ 0)
    double maxOvercutMm = 0;      ///< largest overcut (valleys below the drawing), positive (≥ 0)
    double asCutDiameterMm = 0;   ///< cylinder: mean diameter; cone: at the gauge plane
    double asCutHalfAngleRad = 0; ///< cone: fitted half angle as cut
    bool withinTolerance = false;
};

/// Everything the kernel found.
struct CutResult {
    std::vector<ToolMove> moves;      ///< the passes' cutting moves
    std::vector<BetweenMove> between; ///< the moves between passes, in order (not cut)
    Profile stock;                    ///< stock radius on the same samples as asCut
    Profile nominal;                  ///< drawing radius (NaN where the drawing says nothing)
    Profile asCut;                    ///< exact axisymmetric as-cut profile (the marks' valleys)
    Profile crest;                    ///< the feed marks' crests on the same samples (≥ asCut)
    std::vector<Profile> afterPass;   ///< as-cut profile after each pass
    std::vector<double> deviationMm;  ///< signed normal deviation per asCut sample; NaN off-feature
    std::vector<double> crestDeviationMm; ///< the same for the crests: what a gauge touches
    FeedMarkSurface surface;              ///< 3D surface with feed marks R(z, φ)
    std::vector<FeatureReport> features;
    std::vector<Finding> findings;
    bool withinTolerance = false; ///< the verdict
    double gaugeZMm = 0, gaugeNominalDiameterMm = 0, gaugeAsCutDiameterMm = 0;
    double maxLeftOnMm = 0, maxOvercutMm = 0; ///< over all features, as FeatureReport
    /// Volumes of the bar's stick-out, from its free end to the jaws' face (volumeFromZMm ..
    /// volumeToZMm): the extent of the stock and as-cut solids swarf writes. Left-on and overcut
    /// are taken over the drawing's extent (its first feature's start to its last's end).
    double volumeFromZMm = 0, volumeToZMm = 0;
    double stockVolumeMm3 = 0, asCutVolumeMm3 = 0, removedVolumeMm3 = 0;
    double leftoverVolumeMm3 = 0, overcutVolumeMm3 = 0;
    double rtUm = 0, raUm = 0; ///< roughness of the finishing pass's marks, measured (µm)
    int finishingPass = -1;    ///< the pass whose marks rtUm and raUm measure (−1: none)
    /// What moved the main cone, largest first (causes.h); empty until findCauses fills it
    /// (`swarf run` and `swarf view` do; simulate() alone does not).
    std::vector<Cause> causes;

    /// Inside work (a scene cut with a boring bar, inside_kernel.h). `asCut`, `stock`, `nominal`
    /// and the deviations above stay the outside (a boring bar leaves it as the bar is); these
    /// hold the hole, on the same samples. All empty for a scene with no hole.
    bool bored = false;  ///< true if the plan was cut with a boring bar
    Profile boreStock;   ///< the stock's hole before any pass (0: solid)
    Profile bore;        ///< the exact as-cut bore (the marks' valleys; 0: solid)
    Profile boreCrest;   ///< the feed marks' crests inside (≤ bore: nearest the axis)
    Profile boreNominal; ///< the drawn bore (NaN where no inside feature is)
    std::vector<Profile> boreAfterPass;  ///< the as-cut bore after each pass
    std::vector<double> boreDeviationMm; ///< inside deviation (+ left on within the drawn bore)
    std::vector<double> boreCrestDeviationMm; ///< the same for the crests: what a plug gauge meets
};

} // namespace swarf
