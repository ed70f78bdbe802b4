// The insert outline: nose arc between the leading and trailing straight edges.
//
// Geometry (tool plane (z, x), nose centre C at the origin, right-hand tool feeding toward +z):
//   the leading edge leaves the nose at angle κr from +z, direction (cos κr, sin κr), outward
//   normal (sin κr, −cos κr); the trailing edge leaves at κr + ε, direction
//   (cos(κr+ε), sin(κr+ε)), outward normal (−sin(κr+ε), cos(κr+ε)). The nose arc joins the two
//   tangent points through the bottom and spans 180° − ε. Each edge runs for the edge length
//   from its tangent point; a straight chord across the top closes the outline (the insert's
//   body; it never touches the work on a cut the edges can make). A left-hand tool is the mirror
//   image in z. A round insert (shape R) is a full circle of the nose radius.
//   The imaginary tip is C + (r, −r) for R (lowest x, leading z), C + (−r, −r) for L.
#include "swarf/sim/tool_outline.h"

#include <algorithm>
#include <cassert>
#include <cmath>

namespace swarf {
namespace {

constexpr double kTwoPi = 2.0 * kPi;

// ISO 1832 corner angle of a shape letter (references R8); 0 if unknown.
double includedAngleOfShape(char shape) {
    switch (shape) {
    case 'C':
        return degToRad(80);
    case 'D':
        return degToRad(55);
    case 'E':
        return degToRad(75);
    case 'S':
        return degToRad(90);
    case 'T':
        return degToRad(60);
    case 'V':
        return degToRad(35);
    case 'W':
        return degToRad(80);
    default:
        return 0;
    }
}

Eigen::Vector2d polar(double angleRad) {
    return {std::cos(angleRad), std::sin(angleRad)};
}

Eigen::Vector2d mirrorZ(const Eigen::Vector2d& p) {
    return {-p.x(), p.y()};
}

// Angle a brought into [s, s + 2π).
double wrapFrom(double a, double s) {
    double d = std::fmod(a - s, kTwoPi);
    if (d < 0)
        d += kTwoPi;
    return s + d;
}

bool arcContains(const OutlinePiece& p, double angle) {
    return wrapFrom(angle, p.startRad) - p.startRad <= p.sweepRad + 1e-12;
}

OutlinePiece segment(const Eigen::Vector2d& a, const Eigen::Vector2d& b) {
    OutlinePiece p;
    p.kind = OutlinePiece::Kind::Segment;
    p.a = a;
    p.b = b;
    return p;
}

OutlinePiece arc(double r, double startRad, double sweepRad) {
    OutlinePiece p;
    p.kind = OutlinePiece::Kind::Arc;
    p.centre = {0, 0};
    p.radius = r;
    p.startRad = startRad;
    p.sweepRad = sweepRad;
    p.a = r * polar(startRad);
    p.b = r * polar(startRad + sweepRad);
    return p;
}

} // namespace

ToolOutline::ToolOutline(const Tool& tool) {
    r_ = tool.noseRadiusMm;
    assert(r_ > 0);
    const double kappa = tool.enteringAngleRad;
    double eps =
        tool.includedAngleRad > 0 ? tool.includedAngleRad : includedAngleOfShape(tool.shape);
    const bool round = tool.shape == 'R' || eps >= kPi - 1e-9 || eps <= 0;
    const bool left = tool.hand == Hand::L;

    if (round) {
        pieces_.push_back(arc(r_, 0.0, kTwoPi));
        // A circle has no straight edges: report the holder's angles, the edges' would-be
        // directions, for messages only.
        leadAngle_ = left ? kPi - kappa : kappa;
        trailAngle_ = left ? -kappa : kappa + kPi;
    } else {
        const double lead = kappa, trail = kappa + eps;
        const double len = tool.edgeLengthMm;
        const Eigen::Vector2d nLead{std::sin(lead), -std::cos(lead)};
        const Eigen::Vector2d nTrail{-std::sin(trail), std::cos(trail)};
        const Eigen::Vector2d t1 = r_ * nLead, t2 = r_ * nTrail;
        const Eigen::Vector2d leadEnd = t1 + len * polar(lead);
        const Eigen::Vector2d trailEnd = t2 + len * polar(trail);
        // CCW: nose arc from the trailing tangent point through the bottom to the leading one,
        // up the leading edge, across the top, down the trailing edge.
        const double a0 = trail + kPi / 2;
        pieces_.push_back(arc(r_, std::fmod(a0, kTwoPi), kPi - eps));
        pieces_.push_back(segment(t1, leadEnd));
        pieces_.push_back(segment(leadEnd, trailEnd));
        pieces_.push_back(segment(trailEnd, t2));
        leadAngle_ = lead;
        trailAngle_ = trail;
        if (left) {
            // Mirror in z and reverse the order so the boundary stays counter-clockwise.
            std::vector<OutlinePiece> m;
            for (auto it = pieces_.rbegin(); it != pieces_.rend(); ++it) {
                if (it->kind == OutlinePiece::Kind::Segment) {
                    m.push_back(segment(mirrorZ(it->b), mirrorZ(it->a)));
                } else {
                    const double end = it->startRad + it->sweepRad;
                    m.push_back(arc(r_, wrapFrom(kPi - end, 0.0), it->sweepRad));
                }
            }
            pieces_ = m;
            leadAngle_ = kPi - lead;
            trailAngle_ = kPi - trail;
        }
    }
    tip_ = left ? Eigen::Vector2d(-r_, -r_) : Eigen::Vector2d(r_, -r_);

    // The lower chain: boundary parts whose outward normal points toward −x.
    uMin_ = std::numeric_limits<double>::infinity();
    uMax_ = -uMin_;
    for (const auto& p : pieces_) {
        if (p.kind == OutlinePiece::Kind::Segment) {
            uMin_ = std::min({uMin_, p.a.x(), p.b.x()});
            uMax_ = std::max({uMax_, p.a.x(), p.b.x()});
            // CCW boundary: outward normal of a→b is (dy, −dz); lower chain if its x part < 0,
            // i.e. the segment runs toward +z.
            const double du = p.b.x() - p.a.x();
            if (du > 1e-15) {
                LowerPiece lp;
                lp.u0 = p.a.x();
                lp.u1 = p.b.x();
                lp.x0 = p.a.y();
                lp.slope = (p.b.y() - p.a.y()) / du;
                lower_.push_back(lp);
            }
        } else {
            // Angles of the arc that lie on the lower half circle [π, 2π] (mod 2π).
            const double s = p.startRad, e = p.startRad + p.sweepRad;
            for (double base : {kPi, 3 * kPi, -kPi}) {
                const double lo = std::max(s, base), hi = std::min(e, base + kPi);
                if (hi - lo > 1e-15) {
                    LowerPiece lp;
                    lp.arc = true;
                    lp.cz = p.centre.x();
                    lp.cx = p.centre.y();
                    lp.rad = p.radius;
                    lp.u0 = lp.cz + p.radius * std::cos(lo);
                    lp.u1 = lp.cz + p.radius * std::cos(hi);
                    lower_.push_back(lp);
                }
            }
            // Extent in z: the arc's extreme points if inside the sweep, else its ends.
            for (double ang : {0.0, kPi}) {
                if (arcContains(p, ang)) {
                    const double u = p.centre.x() + p.radius * std::cos(ang);
                    uMin_ = std::min(uMin_, u);
                    uMax_ = std::max(uMax_, u);
                }
            }
            uMin_ = std::min({uMin_, p.a.x(), p.b.x()});
            uMax_ = std::max({uMax_, p.a.x(), p.b.x()});
        }
    }
    std::sort(lower_.begin(), lower_.end(),
              [](const LowerPiece& a, const LowerPiece& b) { return a.u0 < b.u0; });
}

Eigen::Vector2d ToolOutline::support(double slope) const {
    // Minimise x − slope·u over the boundary: at segment ends, or on an arc where the outward
    // normal is parallel to (slope, −1).
    Eigen::Vector2d best{0, 0};
    double bestVal = std::numeric_limits<double>::infinity();
    auto consider = [&](const Eigen::Vector2d& p) {
        const double v = p.y() - slope * p.x();
        if (v < bestVal) {
            bestVal = v;
            best = p;
        }
    };
    const double normalAngle = std::atan2(-1.0, slope);
    for (const auto& p : pieces_) {
        consider(p.a);
        consider(p.b);
        if (p.kind == OutlinePiece::Kind::Arc && arcContains(p, normalAngle)) {
            consider(p.centre + p.radius * polar(normalAngle));
        }
    }
    return best;
}

std::vector<Eigen::Vector2d> ToolOutline::polygon(double maxChordErrorMm) const {
    assert(maxChordErrorMm > 0);
    std::vector<Eigen::Vector2d> out;
    for (const auto& p : pieces_) {
        if (p.kind == OutlinePiece::Kind::Segment) {
            out.push_back(p.a);
            continue;
        }
        // Chord sagitta r(1 − cos(Δ/2)) ≤ maxChordError.
        const double ratio = std::clamp(1.0 - maxChordErrorMm / p.radius, -1.0, 1.0);
        const double maxStep = std::max(2.0 * std::acos(ratio), 1e-4);
        const int n = std::max(1, static_cast<int>(std::ceil(p.sweepRad / maxStep)));
        // The arc's end point is the next piece's start (or, for a full circle, its own start).
        for (int i = 0; i < n; ++i) {
            out.push_back(p.centre + p.radius * polar(p.startRad + p.sweepRad * i / n));
        }
    }
    return out;
}

} // namespace swarf
