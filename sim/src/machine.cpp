// The machine model: readings → imaginary-tip moves, with the compound angle as set, diameter or
// radius dials, backlash on every slide (readings dialled in order or approached from below) and
// CNC paths.
#include "swarf/sim/machine.h"

#include "swarf/sim/kernel.h"

#include <algorithm>
#include <cmath>

namespace swarf {

double followWithBacklash(double travelBeforeMm, double handwheelMm, double backlashMm) {
    return std::clamp(travelBeforeMm, handwheelMm, handwheelMm + std::max(0.0, backlashMm));
}

double crossTravelFromReading(const Setup& setup, double readingMm) {
    return setup.crossDial == DialMode::Diameter ? 0.5 * readingMm : readingMm;
}

Eigen::Vector2d tipFromTravels(const Setup& setup, double crossTravelMm, double compoundTravelMm,
                               double saddleTravelMm) {
    const double alpha = setup.compoundAxisAngleRad();
    const double advance = setup.compoundAdvanceToward == Widens::TowardChuck ? 1.0 : -1.0;
    const double z = setup.zeroZMm + saddleTravelMm + compoundTravelMm * advance * std::cos(alpha);
    const double x =
        0.5 * setup.zeroDiameterMm - crossTravelMm - compoundTravelMm * std::sin(alpha);
    return {z, x};
}

namespace {

// The three slides' travels, tracking where each slide sits in its backlash gap.
struct Slides {
    double cross = 0, compound = 0, saddle = 0;
};

} // namespace

std::vector<ToolMove> planMoves(const Scene& scene) {
    const Setup& su = scene.setup;
    std::vector<ToolMove> moves;
    Slides at; // travels; all readings zero, each slide last moved increasing
    // Bringing a slide to a reading. In order: the handwheel goes straight there and the slide
    // follows with its backlash. Taken up (setting a slide before a pass): the handwheel is wound
    // back past the reading and brought up to it, so the slide sits exactly at the reading.
    // During a pass the moving slide always follows with its backlash from where it started.
    auto follow = [&](double& travel, double handwheel, double backlash, bool setting) {
        travel = setting && su.approach == Approach::TakeUp
                     ? handwheel
                     : followWithBacklash(travel, handwheel, backlash);
    };
    auto setCross = [&](double reading, bool setting = true) {
        follow(at.cross, crossTravelFromReading(su, reading), su.cross.backlashMm, setting);
    };
    auto setCompound = [&](double reading, bool setting = true) {
        follow(at.compound, reading, su.compound.backlashMm, setting);
    };
    auto setSaddle = [&](double reading, bool setting = true) {
        follow(at.saddle, reading, su.saddle.backlashMm, setting);
    };
    auto tipNow = [&] { return tipFromTravels(su, at.cross, at.compound, at.saddle); };

    for (std::size_t i = 0; i < scene.plan.passes.size(); ++i) {
        const Pass& ps = scene.plan.passes[i];
        ToolMove m;
        m.pass = static_cast<int>(i);
        m.feedMmPerRev = ps.feedMmPerRev;
        m.crossFrom = m.crossTo = ps.crossMm;
        m.compoundFrom = m.compoundTo = ps.compoundMm;
        m.saddleFrom = m.saddleTo = ps.saddleMm;
        if (ps.kind == PassKind::Path) {
            // CNC: the control places the imaginary tip itself; no dials, no backlash.
            for (std::size_t k = 1; k < ps.pathZX.size(); ++k) {
                ToolMove pm = m;
                pm.tipFrom = {ps.pathZX[k - 1].first, ps.pathZX[k - 1].second};
                pm.tipTo = {ps.pathZX[k].first, ps.pathZX[k].second};
                pm.crossFrom = pm.crossTo = pm.compoundFrom = pm.compoundTo = 0;
                pm.saddleFrom = pm.saddleTo = 0;
                moves.push_back(pm);
            }
            continue;
        }
        // Set the slides that stay put, then bring the moving one to its start reading; the
        // tool is taken to the start clear of the work (not simulated as a cut).
        switch (ps.kind) {
        case PassKind::Compound:
            setCross(ps.crossMm);
            setSaddle(ps.saddleMm);
            setCompound(ps.fromMm);
            m.compoundFrom = ps.fromMm;
            m.compoundTo = ps.toMm;
            break;
        case PassKind::Saddle:
            setCross(ps.crossMm);
            setCompound(ps.compoundMm);
            setSaddle(ps.fromMm);
            m.saddleFrom = ps.fromMm;
            m.saddleTo = ps.toMm;
            break;
        case PassKind::CrossSlide:
            setCompound(ps.compoundMm);
            setSaddle(ps.saddleMm);
            setCross(ps.fromMm);
            m.crossFrom = ps.fromMm;
            m.crossTo = ps.toMm;
            break;
        case PassKind::Path:
            break;
        }
        m.tipFrom = tipNow();
        switch (ps.kind) {
        case PassKind::Compound:
            setCompound(ps.toMm, false);
            break;
        case PassKind::Saddle:
            setSaddle(ps.toMm, false);
            break;
        case PassKind::CrossSlide:
            setCross(ps.toMm, false);
            break;
        case PassKind::Path:
            break;
        }
        m.tipTo = tipNow();
        moves.push_back(m);
    }
    return moves;
}

} // namespace swarf
