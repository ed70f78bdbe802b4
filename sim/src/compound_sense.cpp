// The compound's sense against a cone, and which way each pass feeds (see compound_sense.h).
#include "swarf/sim/compound_sense.h"

#include "swarf/sim/compound_setting.h"
#include "swarf/sim/machine.h"

#include <algorithm>
#include <cmath>

namespace swarf {
namespace {

// +1 if the tool's leading side is toward the chuck (hand R, and N taken as R), −1 for L.
int leadOf(const Tool& tool) {
    return tool.hand == Hand::L ? -1 : 1;
}

const char* handWords(const Tool& tool) {
    return tool.hand == Hand::L ? "left-hand" : "right-hand";
}

std::string senseWords(int along, int across) {
    std::string s = along > 0 ? "toward the chuck" : along < 0 ? "toward the tailstock" : "";
    if (across != 0)
        s += std::string(s.empty() ? "" : " and ") + (across > 0 ? "out" : "in");
    return s;
}

std::string keys(int along, int across) {
    return std::string("advance = \"") + (along > 0 ? "chuck" : "tailstock") + "\", across = \"" +
           (across > 0 ? "out" : "in") + "\"";
}

} // namespace

FeedDirection passFeedDirection(const Scene& scene, const Pass& pass) {
    const Setup& su = scene.setup;
    Eigen::Vector2d a{0, 0}, b{0, 0};
    if (pass.kind == PassKind::Path) {
        if (pass.pathZX.size() >= 2) {
            a = {pass.pathZX[0].first, pass.pathZX[0].second};
            b = {pass.pathZX[1].first, pass.pathZX[1].second};
        }
    } else {
        auto at = [&](double moving) {
            const double c = pass.kind == PassKind::CrossSlide ? moving : pass.crossMm;
            const double p = pass.kind == PassKind::Compound ? moving : pass.compoundMm;
            const double s = pass.kind == PassKind::Saddle ? moving : pass.saddleMm;
            return tipFromTravels(su, crossTravelFromReading(su, c), p, s);
        };
        a = at(pass.fromMm);
        b = at(pass.toMm);
    }
    const Eigen::Vector2d d = b - a;
    const double len = d.norm();
    FeedDirection f;
    if (!(len > 0))
        return f;
    const double tiny = 1e-9 * std::max(1.0, len);
    f.along = d.x() > tiny ? 1 : d.x() < -tiny ? -1 : 0;
    f.across = d.y() > tiny ? 1 : d.y() < -tiny ? -1 : 0;
    const int lead = leadOf(scene.tool);
    if (f.along == lead)
        f.edge = FeedDirection::Edge::Main;
    else if (f.along == -lead)
        f.edge = FeedDirection::Edge::Trailing;
    else
        f.edge = f.across < 0 ? FeedDirection::Edge::Plunge : FeedDirection::Edge::BackingOut;
    return f;
}

std::string feedDirectionWords(const FeedDirection& d) {
    std::string s = "feeds " + senseWords(d.along, d.across);
    switch (d.edge) {
    case FeedDirection::Edge::Main:
        return s + ", main edge cutting";
    case FeedDirection::Edge::Trailing:
        return s + ", trailing edge cutting";
    case FeedDirection::Edge::Plunge:
        return s + ", nose and trailing edge cutting (plunging)";
    case FeedDirection::Edge::BackingOut:
        return s + ", nose cutting (backing out)";
    case FeedDirection::Edge::None:
        break;
    }
    return "does not move";
}

std::string compoundSenseWords(const Setup& setup) {
    return senseWords(setup.compoundAdvanceToward == Widens::TowardChuck ? 1 : -1,
                      setup.compoundAdvanceAcross == Across::Out ? 1 : -1);
}

CompoundFit compoundFitForCone(const Setup& setup, const Tool& tool, const Cone& cone,
                               bool windingIn) {
    CompoundFit fit;
    const int a = setup.compoundAdvanceToward == Widens::TowardChuck ? 1 : -1;
    const int out = setup.compoundAdvanceAcross == Across::Out ? 1 : -1;
    const int g = cone.growthSign() > 0 ? 1 : -1;
    // Parallel when moving toward the chuck goes out exactly where the cone grows toward it.
    fit.parallel = a * out == g;
    const int lead = leadOf(tool);
    // The two senses that follow this cone; the one feeding toward the leading side uses the
    // main edge.
    const int mainAlong = lead, mainAcross = lead * g;
    const std::string widens = g > 0 ? "chuck" : "tailstock";
    const std::string mainWay =
        senseWords(mainAlong, mainAcross) + " (" + keys(mainAlong, mainAcross) + ")";
    const std::string otherWay =
        senseWords(-mainAlong, -mainAcross) + " (" + keys(-mainAlong, -mainAcross) + ")";
    if (!fit.parallel) {
        fit.message = "the compound moves the tool " + compoundSenseWords(setup) +
                      " as its reading grows, but the cone widens toward the " + widens +
                      ": winding it would run across the cone's line, not along it, whatever "
                      "its angle. Swing it to the other side of the axis, so that winding it in "
                      "moves the tool " +
                      mainWay + ", where the " + handWords(tool) +
                      " tool cuts with its main edge; or " + otherWay +
                      ", where it cuts with its trailing edge.";
        return fit;
    }
    const int feedAlong = windingIn ? a : -a;
    fit.trailingEdge = feedAlong != lead;
    if (fit.trailingEdge)
        fit.message = std::string("winding the compound ") + (windingIn ? "in" : "out") +
                      " moves the tool " + senseWords(feedAlong, windingIn ? out : -out) +
                      ": the " + handWords(tool) +
                      " tool feeds toward its trailing side and cuts with its trailing edge "
                      "(the short edge, at a shallow angle to the cut: a thin wide chip, light "
                      "cuts only). To cut with the main edge, swing the compound so that "
                      "winding it in moves the tool " +
                      mainWay + ".";
    return fit;
}

std::optional<std::string> otherScaleNote(const Setup& setup, const Feature& cone) {
    const double th = cone.cone.halfAngleRad;
    const double tol = std::max(cone.angleToleranceRad, 0.0);
    const bool axis = setup.compoundScale == CompoundScale::FromAxis;
    const CompoundScale other = axis ? CompoundScale::FromCrossSlide : CompoundScale::FromAxis;
    const double rhoOther = compoundScaleReadingRad(th, other);
    const double rhoRight = compoundScaleReadingRad(th, setup.compoundScale);
    const double near = std::max(degToRad(0.5), tol);
    if (std::fabs(setup.compoundReadingRad - rhoOther) > near)
        return std::nullopt;
    if (std::fabs(setup.compoundAxisAngleRad() - th) <= tol)
        return std::nullopt;
    return "the compound reads " + formatDms(setup.compoundReadingRad, 0) +
           " on a scale graduated from the " + (axis ? "spindle axis" : "cross-slide") +
           ", which sets it " + formatDms(setup.compoundAxisAngleRad(), 0) +
           " from the axis; the cone's half angle is " + formatDms(th, 0) + ". " +
           formatDms(setup.compoundReadingRad, 0) + " is what a scale graduated from the " +
           (axis ? "cross-slide" : "spindle axis") +
           " would read for this cone: it looks read off the other scale. Set " +
           formatDms(rhoRight, 0) + " on this scale, or, if the scale is graduated from the " +
           (axis ? "cross-slide" : "spindle axis") + ", write scale = \"" +
           (axis ? "cross_slide" : "axis") + "\".";
}

} // namespace swarf
