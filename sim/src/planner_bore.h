#pragma once
// Internal to the planner: the passes of one inside cone as planInsideCone builds them
// (planner_inside.cpp). Not a public header.
//
// Geometry: the machine model is the outside's (machine.h, tip x = zeroD/2 − k·c − p·sin α), so
// a reading that opens the bore is a smaller one. The insert cuts the bore as a turning tool cuts
// the twin bar x' = C − x (inside_kernel.h): the nose-radius offset is the outside one for the
// twin's slope, −g·tan θ, and it puts the imaginary tip outside the drawn line, toward the wall
// (references R1, mirrored). A tip h off centre cuts radius √(x² + h²) inside too (references R7).
#include "swarf/sim/planner.h"

#include <string>
#include <utility>
#include <vector>

namespace swarf::detail {

/// The passes of one inside cone, in the scene's zero (setZero) and each stage's own numbers.
/// Lengths mm, angles rad.
class BoreBuilder {
  public:
    BoreBuilder(const Scene& sc, ConePlan& out, const Feature& f);

    void setZero(double zeroDiameterMm, double zeroZMm) {
        zeroD_ = zeroDiameterMm;
        zeroZ_ = zeroZMm;
    }
    /// The inside nose-radius offset: how far outside the drawn bore the tip line runs, radius.
    double noseOutMm() const { return noseOut_; }
    /// ½ for a diameter dial, 1 for a radius dial.
    double crossK() const { return k_; }
    double saddleMm() const { return saddleMm_; }

    /// Saddle passes opening the bore to `radiusMm` from the free end to zEndMm: roughing steps of
    /// at most max_depth, the last at the finishing feed (it is measured). Stage 0 readings count
    /// from the first touch-off (stage0CrossOffsetMm), 1 from the references.
    void boreCylinder(double radiusMm, double zEndMm, const std::string& what, int stage);

    /// The compound's one setting: the saddle reading and the compound's range for a tip running
    /// from zMouthMm to zDeepMm. False if the compound's travel is too short for it.
    bool planSetting(double zMouthMm, double zDeepMm);

    /// The exact cross-slide reading of the tip line leaving `leftMm` of metal normal to the cone.
    double exactCross(double leftMm) const;

    /// A compound pass over the setting at cross-slide reading `readingMm`.
    void conePass(bool finish, const std::string& what, double readingMm);

    /// The deepest metal between the bore as it stands and the cone, normal to the cone.
    double thicknessMm() const;

  private:
    double coneR(double z) const;
    double tipXFor(double radiusMm) const;
    double crossFor(double tipX) const { return (0.5 * zeroD_ - tipX) / k_; }
    double currentR(double z) const;
    void add(const Pass& p, const PassDisplay& d);

    const Scene& sc_;
    ConePlan& out_;
    const Feature& f_;
    double th_ = 0, g_ = -1, a_ = 1, k_ = 0.5, r_ = 0, noseOut_ = 0;
    double zeroD_ = 0, zeroZ_ = 0, saddleMm_ = 0, pFrom_ = 0, pTo_ = 0;
    std::vector<std::pair<double, double>> opened_; // (z end, radius) of each bored cylinder
};

} // namespace swarf::detail
