#pragma once
// Internal to the planner: the state used while a plan is built (see planner.cpp and
// planner_cone.cpp). Not a public header.
#include "swarf/sim/planner.h"

#include <optional>
#include <string>
#include <utility>
#include <vector>

namespace swarf::detail {

/// Builds the passes of one cone plan into a ConePlan. Lengths mm, angles rad.
class PlanBuilder {
  public:
    PlanBuilder(const Scene& scene, ConePlan& out, const Feature& feature);

    /// Sets the references' zero: the tip at (zeroZ, zeroD/2) reads 0 on every slide.
    void setZero(double zeroDiameterMm, double zeroZMm) {
        zeroD_ = zeroDiameterMm;
        zeroZ_ = zeroZMm;
    }
    /// Straight-turning passes (saddle) from the bar's free end to zEndMm at radiusMm.
    void turnCylinder(double radiusMm, double zEndMm, bool endAtShoulder, const std::string& what,
                      int stage);
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
    std::vector<Turned> turned_;
    std::vector<Setting> settings_;
};

} // namespace swarf::detail
