// Dials, and whether an insert and holder can follow a cone (references R8).
#include "swarf/sim/planner.h"

#include <algorithm>
#include <cmath>
#include <cstdio>

namespace swarf {
namespace {

// ISO 1832 corner angles (references R8), degrees.
struct ShapeAngle {
    char letter;
    double includedDeg;
};
constexpr ShapeAngle kShapes[] = {{'C', 80}, {'D', 55}, {'E', 75}, {'S', 90},
                                  {'T', 60}, {'V', 35}, {'W', 80}};

// ISO 5608 holder styles and their entering angles κr (references R8), degrees.
struct HolderAngle {
    char letter;
    double kappaDeg;
};
constexpr HolderAngle kHolders[] = {{'A', 90},    {'B', 75},  {'D', 45}, {'E', 60},    {'F', 90},
                                    {'G', 90},    {'J', 93},  {'K', 75}, {'L', 95},    {'N', 63},
                                    {'S', 45},    {'T', 60},  {'Y', 85}, {'H', 107.5}, {'Q', 107.5},
                                    {'P', 117.5}, {'V', 72.5}};

// Insert-in-holder pairs that are usual in the trade (common practice), most usual first.
struct Pair {
    char shape, holder;
};
constexpr Pair kUsualPairs[] = {{'C', 'L'}, {'D', 'J'}, {'V', 'J'}, {'W', 'L'}, {'T', 'G'},
                                {'D', 'N'}, {'V', 'V'}, {'S', 'S'}, {'D', 'H'}, {'V', 'H'},
                                {'C', 'K'}, {'S', 'K'}, {'T', 'N'}, {'D', 'D'}};

double shapeIncludedRad(char letter) {
    for (const auto& s : kShapes)
        if (s.letter == letter)
            return degToRad(s.includedDeg);
    return 0;
}

double holderKappaRad(char letter) {
    for (const auto& h : kHolders)
        if (h.letter == letter)
            return degToRad(h.kappaDeg);
    return 0;
}

// The path angle as seen by a right-hand tool (a left-hand tool is the mirror image in z).
double asRightHand(Hand hand, double pathAngleRad) {
    return hand == Hand::L ? -pathAngleRad : pathAngleRad;
}

bool follows(double kappaRad, double epsRad, Hand hand, double pathAngleRad, double clearanceRad) {
    const double phi = asRightHand(hand, pathAngleRad);
    // The nose arc supports a path whose angle lies between the trailing edge's limit
    // κr + ε − 180° and the leading edge κr; keep a clearance from both.
    return phi > kappaRad + epsRad - kPi + clearanceRad && phi < kappaRad - clearanceRad;
}

// The steepest descent (rad, ≥ 0 when possible) a tool follows: 180° − κr − ε − clearance.
double descentLimitRad(double kappaRad, double epsRad, double clearanceRad) {
    return kPi - kappaRad - epsRad - clearanceRad;
}

} // namespace

DialSetting dialSetting(const Slide& slide, double readingMm) {
    const double divs = readingMm / slide.mmPerDivision;
    const double perTurn = slide.divisionsPerTurn;
    double turns = std::floor(divs / perTurn + 1e-9);
    double division = divs - turns * perTurn;
    if (division < 0)
        division = 0;
    // Rounding noise near a whole turn shows as the next turn at division 0.
    if (division > perTurn - 1e-6) {
        division = 0;
        turns += 1;
    }
    return {static_cast<long>(turns), division};
}

double roundToDivision(const Slide& slide, double readingMm, int stepsPerDivision) {
    const double step = slide.mmPerDivision / std::max(1, stepsPerDivision);
    return std::round(readingMm / step) * step;
}

bool toolFollowsSlope(const Tool& tool, double pathAngleRad, double clearanceRad) {
    if (tool.shape == 'R')
        return true; // a round insert has no straight edge to rub
    double eps = tool.includedAngleRad > 0 ? tool.includedAngleRad : shapeIncludedRad(tool.shape);
    if (eps <= 0 || eps >= kPi - 1e-9)
        return true;
    return follows(tool.enteringAngleRad, eps, tool.hand, pathAngleRad, clearanceRad);
}

std::vector<std::string> suggestTools(const Tool& tool, double pathAngleRad, int count) {
    std::vector<std::string> out;
    const Hand sameHand = tool.hand == Hand::L ? Hand::L : Hand::R;
    const Hand otherHand = sameHand == Hand::R ? Hand::L : Hand::R;
    char buf[320];
    for (Hand hand : {sameHand, otherHand}) {
        for (const Pair& p : kUsualPairs) {
            if (static_cast<int>(out.size()) >= count)
                return out;
            const double kappa = holderKappaRad(p.holder);
            const double eps = shapeIncludedRad(p.shape);
            if (!follows(kappa, eps, hand, pathAngleRad, kEdgeClearanceRad))
                continue;
            // Half angles it follows (with clearance) for a cone narrowing / widening toward the
            // chuck; a left-hand tool is the mirror image.
            const double down = descentLimitRad(kappa, eps, kEdgeClearanceRad);
            const double up = kappa - kEdgeClearanceRad;
            const double narrowing = hand == Hand::L ? up : down;
            const double widening = hand == Hand::L ? down : up;
            std::snprintf(
                buf, sizeof buf,
                "shape %c insert (%.0f° corner, ISO 1832) in a style %c holder "
                "(entering angle %.1f°, ISO 5608), hand %c: follows cones narrowing "
                "toward the chuck up to %.1f° half angle and widening toward it up to %.1f°",
                p.shape, radToDeg(eps), p.holder, radToDeg(kappa), hand == Hand::L ? 'L' : 'R',
                std::min(radToDeg(narrowing), 90.0), std::min(radToDeg(widening), 90.0));
            out.emplace_back(buf);
        }
    }
    if (static_cast<int>(out.size()) < count) {
        out.emplace_back("a round insert (shape R, ISO 1832): it has no straight edge to rub; "
                         "its large nose radius needs its own offset and a stiff set-up");
    }
    return out;
}

} // namespace swarf
