// Notes on a valid scene that are not errors.
#include "swarf/sim/scene_notes.h"

#include "swarf/sim/compound_sense.h"
#include "swarf/sim/findings.h"
#include "swarf/sim/inside_work.h"
#include "swarf/sim/tool_outline.h"

#include <cmath>
#include <cstdio>

namespace swarf {

namespace {

std::string fixed(double v, int decimals) {
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.*f", decimals, v);
    return buf;
}

// The feature's size for the tolerance note: the diameter the tolerance is on.
double tolerancedDiameterMm(const Feature& f) {
    return f.kind == FeatureKind::Cone ? f.cone.gaugeDiameterMm : f.diameterMm;
}

void stickOutNotes(const Scene& s, std::vector<std::string>& notes) {
    const Stock& st = s.stock;
    // Common practice: work held in a chuck alone sticks out about three diameters or less.
    if (!st.tailstockSupport && st.stickOutMm > 3 * st.diameterMm)
        notes.push_back("stick-out is " + fixed(st.stickOutMm / st.diameterMm, 1) +
                        " bar diameters with no tailstock support; about 3 or less is usual for "
                        "work held in a chuck alone");
    // Room for the insert beyond the part's end: finishing the last feature puts the imaginary
    // tip at its end, and the insert reaches past the tip toward the chuck.
    if (s.part.features.empty())
        return;
    const ToolOutline outline(s.tool);
    const double reachPastTipMm = outline.uMaxMm() - outline.imaginaryTip().x();
    const double zEnd = s.part.zMaxMm();
    const double needJawZ = zEnd + std::max(0.0, reachPastTipMm) + kJawClearanceMm;
    if (needJawZ > st.jawZMm() + 1e-9) {
        const double reach = std::max(0.0, reachPastTipMm);
        notes.push_back(
            "stick-out " + formatLength(st.stickOutMm, s.units) + " leaves " +
            formatLength(st.jawZMm() - zEnd, s.units) + " between the part's end and the jaws" +
            (reach > 1e-3 ? ", and the insert reaches " + formatLength(reach, s.units) +
                                " past its tip toward the chuck"
                          : std::string()) +
            ": finishing the end brings it within " + formatLength(kJawClearanceMm, s.units) +
            " of the jaws; a stick-out of at least " +
            formatLength(needJawZ + st.faceAllowanceMm, s.units) + " gives the tool room");
    }
}

void compoundNotes(const Scene& s, std::vector<std::string>& notes) {
    const Feature* cone = s.part.mainCone();
    if (!cone)
        return;
    // The compound's sense against the cone, whether or not there are passes yet: winding in as
    // it cuts, unless the scene's compound passes wind it out.
    bool windingIn = true;
    for (const Pass& p : s.plan.passes)
        if (p.kind == PassKind::Compound) {
            windingIn = p.toMm > p.fromMm;
            break;
        }
    const CompoundFit fit = compoundFitForCone(s.setup, s.tool, cone->cone, windingIn);
    if (!fit.parallel)
        notes.push_back("the compound cannot cut the cone '" + cone->name + "': " + fit.message);
    else if (fit.trailingEdge)
        notes.push_back("the cone '" + cone->name +
                        "' is cut with the trailing edge: " + fit.message);
    if (auto other = otherScaleNote(s.setup, *cone))
        notes.push_back(*other);
    // The angle and travel notes matter only when the plan cuts with the compound.
    bool compoundPasses = false;
    for (const Pass& p : s.plan.passes)
        compoundPasses = compoundPasses || p.kind == PassKind::Compound;
    if (!compoundPasses)
        return;
    const double alpha = s.setup.compoundAxisAngleRad();
    const double diff = alpha - cone->cone.halfAngleRad;
    if (std::fabs(diff) > cone->angleToleranceRad)
        notes.push_back("the compound's true angle differs from the cone's half angle by " +
                        formatDms(diff) + ", more than the angle tolerance ± " +
                        formatDms(cone->angleToleranceRad));
    const double length = cone->zEndMm - cone->zStartMm;
    if (alpha < kPi / 2 && length / std::cos(alpha) > s.setup.compound.travelMm)
        notes.push_back("the cone is " + formatLength(length, s.units) +
                        " long: the compound needs " +
                        formatLength(length / std::cos(alpha), s.units) +
                        " of travel to cut it in one stroke but has " +
                        formatLength(s.setup.compound.travelMm, s.units));
}

// Plausible units: numbers that make sense only in another unit or as another quantity.
void unitNotes(const Scene& s, std::vector<std::string>& notes) {
    const Units u = s.units;
    for (std::size_t i = 0; i < s.part.features.size(); ++i) {
        const Feature& f = s.part.features[i];
        const double d = tolerancedDiameterMm(f);
        if (!f.toleranceFromClass && d > 0 && f.toleranceMm > 0.1 * d)
            notes.push_back("part.feature[" + std::to_string(i + 1) + "].tolerance ± " +
                            formatLength(f.toleranceMm, u) + " is more than a tenth of its " +
                            formatLength(d, u) + " diameter: is the unit right?");
    }
    const std::string limit = formatLength(kPlausibleFeedMmPerRev, u, Precision::Insert);
    int count = 0;
    std::size_t worst = 0;
    for (std::size_t i = 0; i < s.plan.passes.size(); ++i)
        if (s.plan.passes[i].feedMmPerRev > kPlausibleFeedMmPerRev) {
            if (count == 0 || s.plan.passes[i].feedMmPerRev > s.plan.passes[worst].feedMmPerRev)
                worst = i;
            ++count;
        }
    if (count > 0)
        notes.push_back(
            "plan.pass[" + std::to_string(worst + 1) +
            "].feed = " + formatLength(s.plan.passes[worst].feedMmPerRev, u) + " a revolution" +
            (count > 1 ? " (and " + std::to_string(count - 1) + " more passes over " + limit + ")"
                       : std::string()) +
            " is more than " + limit +
            " a revolution: is it a feed per minute, or in another unit?");
    const PlanningOptions& p = s.planning;
    for (const auto& [key, feed] : {std::pair{"rough_feed", p.roughFeedMmPerRev},
                                    std::pair{"finish_feed", p.finishFeedMmPerRev}})
        if (feed > kPlausibleFeedMmPerRev)
            notes.push_back(std::string("planning.") + key + " = " + formatLength(feed, u) +
                            " a revolution is more than " + limit +
                            " a revolution: is it a feed per minute, or in another unit?");
}

} // namespace

std::vector<std::string> sceneNotes(const Scene& scene) {
    std::vector<std::string> notes = scene.readNotes;
    stickOutNotes(scene, notes);
    compoundNotes(scene, notes);
    unitNotes(scene, notes);
    for (std::string& n : insideWorkNotes(scene))
        notes.push_back(std::move(n));
    return notes;
}

} // namespace swarf
