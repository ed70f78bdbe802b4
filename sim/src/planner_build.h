#pragma once
// Internal to the planner: the state used while a plan is built (see planner.cpp and
// planner_cone.cpp). Not a public header.
#include "swarf/sim/compound_sense.h"
#include "swarf/sim/planner.h"

#include <optional>
#include <string>
#include <utility>
#include <vector>

namespace swarf::detail {

/// The shop's steps in words (planner_steps.cpp): face to length; tool on centre height; measure
/// the bar (and, with `touchOff`, touch off on it: crossK is ½ for a diameter dial, 1 for
/// radius); set the compound (after fillIndicator).
std::string faceText(const Scene& sc);
std::string centreHeightText(const Scene& sc);
std::string measureBarText(const Scene& sc, double crossK, bool touchOff);
void fillIndicator(ConePlan& out, const Scene& sc);
std::string setCompoundText(const ConePlan& out, const Scene& sc);

/// The compound as a plan sets it (both planners): readings taken up (approach "take_up", wound
/// back far enough for the backlash), the half angle on the scene's scale, a note on an angle
/// read off the other scale, and the trailing edge when it cuts. False, with the problem said,
/// when the compound cannot cut the cone (`fit` from compoundFitForCone).
bool setUpCompound(ConePlan& out, const Scene& scene, const Feature& cone, const CompoundFit& fit);

/// The end of either planner: a caution for a cross-slide reading beyond its travel, `planned`
/// set, and a plan longer than kMaxPasses refused (the problem said, with `advice` on what else
/// would shorten it, and the plan emptied): false then.
bool settlePlanSize(ConePlan& out, const Scene& scene, const std::string& advice);

/// Appends a step in words (not a pass) to the plan's order of operations.
void addStep(ConePlan& out, PlanStep::Kind kind, std::string text);

/// Fills the checks of a plan (check plane and diameters, rolls, sine bar, roughness) for the
/// feature being planned (planner_checks.cpp).
void fillChecks(ConePlan& out, const Scene& sc, const Feature& f);

/// Builds the passes of one cone plan into a ConePlan. Lengths mm, angles rad.
class PlanBuilder {
  public:
    PlanBuilder(const Scene& scene, ConePlan& out, const Feature& feature);

    /// Sets the references' zero: the tip at (zeroZ, zeroD/2) reads 0 on every slide.
    void setZero(double zeroDiameterMm, double zeroZMm) {
        zeroD_ = zeroDiameterMm;
        zeroZ_ = zeroZMm;
    }
    /// Straight-turning passes (saddle) from the bar's free end to zEndMm at radiusMm; the
    /// finishing pass is recorded against featureIndex (−1: none, e.g. a reference diameter).
    void turnCylinder(double radiusMm, double zEndMm, bool endAtShoulder, const std::string& what,
                      int stage, int featureIndex = -1);
    /// Splits the compound's run into saddle settings that its travel can reach.
    void planSettings();
    /// One compound pass at normalLeftMm outside the cone (0: finishing), in every setting.
    /// False if there is no metal to cut at that depth.
    bool compoundPass(double normalLeftMm, bool finish, const std::string& what, int passNo,
                      int passCount);
    /// Stepped saddle roughing for a cone widening toward the chuck.
    void saddleSteps();
    /// Largest thickness of metal above the cone, normal to it, mm.
    double maxNormalThickness() const;
    /// Cone radius at z.
    double coneR(double z) const;
    /// The wanted imaginary-tip line (radius) at z, normalLeftMm outside the cone.
    double tipLine(double z, double normalLeftMm) const;
    /// Metal radius at z after the passes planned so far (bar and straight passes only).
    double currentR(double z) const;
    /// Whether the cone's low (false) or high (true) end lets the tool run on into air.
    bool endIsFree(bool highEnd) const;
    /// Cross-slide reading (mm of dial) that puts the tip at radius tipX with compound at 0.
    double crossFor(double tipX) const;

    double noseRadialMm() const { return noseRadial_; }
    double tipAheadZMm() const { return tipAheadZ_; }
    double heightCorrMm() const { return heightCorr_; }
    double growth() const { return g_; }
    double crossK() const { return k_; }
    /// The cone's index in the drawing, for its finishing readings.
    void setFeatureIndex(int index) { featureIndex_ = index; }

    /// A finishing pass's cross-slide reading before rounding to the dial, and the feature whose
    /// tolerance it holds.
    struct FinishReading {
        int pass = -1;
        double exactMm = 0;
        int feature = -1;
        double shownOffsetMm = 0; ///< added to the reading as the sheet shows it (stage A)
    };
    const std::vector<FinishReading>& finishReadings() const { return finishes_; }

  private:
    struct Turned {
        double zEndMm, radiusMm;
    };
    struct Setting {
        double zMinMm = 0, zMaxMm = 0, saddleMm = 0;
    };
    std::optional<std::pair<double, double>> tipRange(double normalLeftMm) const;
    void addPass(Pass pass, PassDisplay display);
    double heightCorrAt(double radiusMm) const;

    const Scene& sc_;
    ConePlan& out_;
    const Feature& f_;
    Cone cone_;
    double th_ = 0, g_ = 1, lead_ = 1, a_ = -1, k_ = 0.5, rs_ = 0, z0_ = 0, zLo_ = 0, zHi_ = 0,
           r_ = 0;
    double noseRadial_ = 0, tipAheadZ_ = 0, heightCorr_ = 0;
    double zeroD_ = 0, zeroZ_ = 0;
    int featureIndex_ = -1;
    std::vector<FinishReading> finishes_;
    std::vector<Turned> turned_;
    std::vector<Setting> settings_;
};

/// Keeps the finishing readings on whole divisions where the simulated plan holds each feature's
/// tolerance; tries the other whole division, then half a division (said in the cautions).
void settleFinishReadings(ConePlan& out, const std::vector<PlanBuilder::FinishReading>& finishes);

/// Where compound passes would start in metal, a plunge with the cross-slide down to the deepest
/// of them first, so that each starts in the groove it leaves; `why` says why in the note.
void reliefWhereBuried(ConePlan& out, const std::string& why);

/// Each pass's retract_to: whole turns of the cross-slide out, as few as keep the way back to
/// the next start clear of the metal.
void chooseRetracts(ConePlan& out);

} // namespace swarf::detail
