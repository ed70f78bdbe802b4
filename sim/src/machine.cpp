// The machine model: readings → imaginary-tip moves, with the compound angle and sense as set,
// diameter or radius dials, backlash on every slide (readings dialled in order or approached
// from below), the moves between passes, and CNC paths.
#include "swarf/sim/machine.h"

#include "swarf/sim/boring_checks.h"
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

double turnMm(const Slide& slide) {
    return slide.mmPerDivision * slide.divisionsPerTurn;
}

double defaultRetractReadingMm(const Setup& setup, double endCrossMm, double nextCrossMm) {
    return std::min(endCrossMm, nextCrossMm) - turnMm(setup.cross);
}

double boringBackOffMm(const Scene& scene, double tipXMm) {
    const double hole = 0.5 * scene.stock.boreDiameterMm;
    const double room = barWallClearanceMm(scene.tool, tipXMm, hole);
    const double turn = crossTravelFromReading(scene.setup, turnMm(scene.setup.cross));
    return std::clamp(0.5 * room, 0.05, std::max(0.05, turn));
}

double boringRetractReadingMm(const Scene& scene, double tipXMm, double endCrossMm,
                              double nextCrossMm) {
    const double backOff = boringBackOffMm(scene, tipXMm);
    const double reading = scene.setup.crossDial == DialMode::Diameter ? 2.0 * backOff : backOff;
    return std::max(endCrossMm, nextCrossMm) + reading;
}

RetractLimit retractLimit(const Plan& plan, std::size_t i, bool boringBar) {
    const Pass& p = plan.passes[i];
    RetractLimit r;
    r.atLeast = boringBar;
    r.limitMm = passEndCrossMm(p);
    if (i + 1 < plan.passes.size() && plan.passes[i + 1].kind != PassKind::Path) {
        const double next = passStartCrossMm(plan.passes[i + 1]);
        r.limitMm = boringBar ? std::max(r.limitMm, next) : std::min(r.limitMm, next);
    }
    return r;
}

std::string RetractLimit::expected(const std::string& limitText) const {
    return atLeast ? "expected a boring bar's cross-slide reading off the wall, toward the "
                     "centre, from this pass's end and the next pass's start: at least " +
                         limitText
                   : "expected a cross-slide reading out from this pass's end and the next "
                     "pass's start: at most " +
                         limitText;
}

double passStartCrossMm(const Pass& pass) {
    return pass.kind == PassKind::CrossSlide ? pass.fromMm : pass.crossMm;
}

double passEndCrossMm(const Pass& pass) {
    return pass.kind == PassKind::CrossSlide ? pass.toMm : pass.crossMm;
}

Setup setupForPass(const Setup& setup, const Pass& pass) {
    Setup s = setup;
    if (pass.compoundAngleRad)
        s.compoundReadingRad = *pass.compoundAngleRad;
    if (pass.compoundErrorRad)
        s.compoundErrorRad = *pass.compoundErrorRad;
    return s;
}

Eigen::Vector2d tipFromTravels(const Setup& setup, double crossTravelMm, double compoundTravelMm,
                               double saddleTravelMm) {
    const double alpha = setup.compoundAxisAngleRad();
    const double along = setup.compoundAdvanceToward == Widens::TowardChuck ? 1.0 : -1.0;
    const double across = setup.compoundAdvanceAcross == Across::In ? 1.0 : -1.0;
    const double z = setup.zeroZMm + saddleTravelMm + compoundTravelMm * along * std::cos(alpha);
    const double x =
        0.5 * setup.zeroDiameterMm - crossTravelMm - compoundTravelMm * across * std::sin(alpha);
    return {z, x};
}

namespace {

// One slide: where its handwheel is (travel-equivalent mm) and where the slide sits.
struct SlideState {
    double handwheel = 0, travel = 0;
    bool takenUp() const { return travel == handwheel; }
};

// Walks the plan in time order, recording the passes' cutting moves and the moves between.
class Walker {
  public:
    explicit Walker(const Scene& scene) : sc_(scene), su_(scene.setup) {}

    void run() {
        const auto& passes = sc_.plan.passes;
        bool placed = false; // the tool stands at the end of a manual pass
        for (std::size_t i = 0; i < passes.size(); ++i) {
            const Pass& ps = passes[i];
            const int k = static_cast<int>(i);
            if (ps.kind == PassKind::Path) {
                if (placed)
                    backOut(k - 1, -1, retractAfter(k - 1));
                placed = false;
                pathPass(ps, k);
                continue;
            }
            const double c = passStartCrossMm(ps);
            const double p = ps.kind == PassKind::Compound ? ps.fromMm : ps.compoundMm;
            const double s = ps.kind == PassKind::Saddle ? ps.fromMm : ps.saddleMm;
            if (placed) {
                backOut(k - 1, k, retractAfter(k - 1));
                // A pass with a compound setting of its own: the compound is re-set here, with
                // the tool backed out; the dials keep their zero.
                su_ = setupForPass(sc_.setup, ps);
                bring(SlideName::Compound, p, k - 1, k);
                bring(SlideName::Saddle, s, k - 1, k);
            } else {
                su_ = setupForPass(sc_.setup, ps);
                comeFromOutside(c, p, s);
            }
            feedIn(c, k);
            cutPass(ps, k);
            placed = true;
        }
        if (placed)
            backOut(static_cast<int>(passes.size()) - 1, -1,
                    retractAfter(static_cast<int>(passes.size()) - 1));
    }

    std::vector<ToolMove> cuts;
    std::vector<BetweenMove> between;

  private:
    const Scene& sc_;
    Setup su_; // the set-up as it stands: the pass's own compound setting, if it has one
    SlideState cross_, compound_, saddle_;
    int lastPass_ = -1; // the manual pass that ended last, −1 if none since a path or the start

    SlideState& state(SlideName s) {
        return s == SlideName::Cross ? cross_ : s == SlideName::Compound ? compound_ : saddle_;
    }
    const Slide& slide(SlideName s) const {
        return s == SlideName::Cross      ? su_.cross
               : s == SlideName::Compound ? su_.compound
                                          : su_.saddle;
    }
    double travelOf(SlideName s, double reading) const {
        return s == SlideName::Cross ? crossTravelFromReading(su_, reading) : reading;
    }
    double readingOf(SlideName s, double travel) const {
        return s == SlideName::Cross && su_.crossDial == DialMode::Diameter ? 2.0 * travel : travel;
    }
    Eigen::Vector2d tip() const {
        return tipFromTravels(su_, cross_.travel, compound_.travel, saddle_.travel);
    }
    void readings(double& c, double& p, double& s) const {
        c = readingOf(SlideName::Cross, cross_.handwheel);
        p = compound_.handwheel;
        s = saddle_.handwheel;
    }

    // The reading the cross-slide is backed out to after pass k.
    double retractAfter(int k) const {
        const auto& passes = sc_.plan.passes;
        const Pass& ps = passes[static_cast<std::size_t>(k)];
        if (ps.retractToMm)
            return *ps.retractToMm;
        const double end = passEndCrossMm(ps);
        double next = end;
        if (k + 1 < static_cast<int>(passes.size()) &&
            passes[static_cast<std::size_t>(k + 1)].kind != PassKind::Path)
            next = passStartCrossMm(passes[static_cast<std::size_t>(k + 1)]);
        if (sc_.tool.kind == ToolKind::BoringBar) // off the wall, toward the axis
            return boringRetractReadingMm(sc_, tip().y(), end, next);
        return defaultRetractReadingMm(su_, end, next);
    }

    // Turns one slide's handwheel to `reading` and records the move it makes.
    void turn(SlideName s, double reading, ReturnStep step, int after, int before) {
        SlideState& st = state(s);
        const double hw = travelOf(s, reading);
        if (std::fabs(hw - st.handwheel) < 1e-12)
            return;
        BetweenMove b;
        b.afterPass = after;
        b.beforePass = before;
        b.step = step;
        b.slide = s;
        b.move.pass = before >= 0 ? before : after;
        b.move.feedMmPerRev = 0;
        b.move.tipFrom = tip();
        readings(b.move.crossFrom, b.move.compoundFrom, b.move.saddleFrom);
        st.travel = followWithBacklash(st.travel, hw, slide(s).backlashMm);
        st.handwheel = hw;
        b.move.tipTo = tip();
        readings(b.move.crossTo, b.move.compoundTo, b.move.saddleTo);
        between.push_back(b);
    }

    void backOut(int after, int before, double reading) {
        turn(SlideName::Cross, reading, ReturnStep::BackOut, after, before);
    }

    // The compound or saddle to its next reading: dialled straight (in order), or, taken up,
    // wound back past a lower reading (or one the slide does not sit at) and brought up to it.
    void bring(SlideName s, double reading, int after, int before) {
        SlideState& st = state(s);
        if (su_.approach == Approach::InOrder) {
            turn(s, reading, ReturnStep::Dial, after, before);
            return;
        }
        if (!(reading >= st.handwheel - 1e-12 && st.takenUp())) {
            const double past = su_.windBackTurns * turnMm(slide(s));
            turn(s, reading - past, ReturnStep::WindBack, after, before);
        }
        turn(s, reading, ReturnStep::BringUp, after, before);
        st.travel = st.handwheel; // the wind-back exceeds the backlash (Scene::validate)
    }

    void feedIn(double reading, int before) {
        const int after = lastPass_;
        turn(SlideName::Cross, reading, ReturnStep::FeedIn, after, before);
        if (su_.approach == Approach::TakeUp)
            cross_.travel = cross_.handwheel;
    }

    // Before the first pass (or after a CNC path) the compound and saddle are set to the start
    // readings (dialled from zero in order, or taken up) and the cross-slide stands out, clear
    // of the bar, one turn out from the start or further.
    void comeFromOutside(double c, double p, double s) {
        auto set = [&](SlideState& st, double hw, double backlash) {
            st.travel =
                su_.approach == Approach::TakeUp ? hw : followWithBacklash(st.travel, hw, backlash);
            st.handwheel = hw;
        };
        set(compound_, p, su_.compound.backlashMm);
        set(saddle_, s, su_.saddle.backlashMm);
        // The cross-slide reading whose tip stands one turn's travel outside the bar.
        const double xNow = tipFromTravels(su_, 0.0, compound_.travel, saddle_.travel).y();
        const double xClear =
            0.5 * sc_.stock.diameterMm + crossTravelFromReading(su_, turnMm(su_.cross));
        const double clear = readingOf(SlideName::Cross, xNow - xClear);
        // A boring bar comes into the hole off the wall, on the axis's side of its reading.
        const double entry =
            sc_.tool.kind == ToolKind::BoringBar
                ? boringRetractReadingMm(sc_,
                                         tipFromTravels(su_, crossTravelFromReading(su_, c),
                                                        compound_.travel, saddle_.travel)
                                             .y(),
                                         c, c)
                : std::min(c - turnMm(su_.cross), clear);
        cross_.handwheel = cross_.travel = crossTravelFromReading(su_, entry);
        lastPass_ = -1;
    }

    void pathPass(const Pass& ps, int k) {
        // CNC: the control places the imaginary tip itself; no dials, no backlash.
        for (std::size_t j = 1; j < ps.pathZX.size(); ++j) {
            ToolMove pm;
            pm.pass = k;
            pm.feedMmPerRev = ps.feedMmPerRev;
            pm.tipFrom = {ps.pathZX[j - 1].first, ps.pathZX[j - 1].second};
            pm.tipTo = {ps.pathZX[j].first, ps.pathZX[j].second};
            cuts.push_back(pm);
        }
        lastPass_ = -1;
    }

    // The pass itself: the moving slide follows its handwheel from `from` to `to`.
    void cutPass(const Pass& ps, int k) {
        ToolMove m;
        m.pass = k;
        m.feedMmPerRev = ps.feedMmPerRev;
        readings(m.crossFrom, m.compoundFrom, m.saddleFrom);
        m.tipFrom = tip();
        const SlideName moving = ps.kind == PassKind::Compound ? SlideName::Compound
                                 : ps.kind == PassKind::Saddle ? SlideName::Saddle
                                                               : SlideName::Cross;
        SlideState& st = state(moving);
        const double hw = travelOf(moving, ps.toMm);
        st.travel = followWithBacklash(st.travel, hw, slide(moving).backlashMm);
        st.handwheel = hw;
        m.tipTo = tip();
        readings(m.crossTo, m.compoundTo, m.saddleTo);
        cuts.push_back(m);
        lastPass_ = k;
    }
};

} // namespace

std::vector<ToolMove> planMoves(const Scene& scene) {
    Walker w(scene);
    w.run();
    return std::move(w.cuts);
}

std::vector<BetweenMove> betweenPassMoves(const Scene& scene) {
    Walker w(scene);
    w.run();
    return std::move(w.between);
}

} // namespace swarf
