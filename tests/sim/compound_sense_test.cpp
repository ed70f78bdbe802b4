// Tests for sim/include/swarf/sim/compound_sense.h: the compound's sense along and across the
// axis against a cone, which way each pass feeds and which edge cuts, and an angle set off the
// other scale.
#include "swarf/sim/compound_sense.h"

#include "kernel_scenes.h"
#include "swarf/sim/machine.h"

#include <catch2/catch.hpp>
#include <cmath>

using namespace swarf;
using namespace swarf::testing;

namespace {

Setup sense(Widens along, Across across) {
    Setup s;
    s.compoundAdvanceToward = along;
    s.compoundAdvanceAcross = across;
    return s;
}

Cone cone(Widens widens) {
    return Cone{40.0, 29.0, std::atan(0.05), widens};
}

} // namespace

TEST_CASE("the machine model moves the tip out when the compound advances out", "[machine]") {
    // Source: scenes/README.md [setup], the machine model: z = zero_z + s + p·a·cos α,
    // x = zero_diameter/2 − c·k − p·b·sin α, with b = −1 for across = "out" (derived).
    Setup s = sense(Widens::TowardChuck, Across::Out);
    s.compoundReadingRad = degToRad(10);
    s.zeroDiameterMm = 30;
    s.zeroZMm = 5;
    const Eigen::Vector2d t = tipFromTravels(s, 1.0, 20.0, 2.0);
    CHECK(t.x() == Approx(5 + 2 + 20 * std::cos(degToRad(10))));
    CHECK(t.y() == Approx(15 - 1 + 20 * std::sin(degToRad(10))));
    s.compoundAdvanceAcross = Across::In; // the meaning every scene had before `across`
    CHECK(tipFromTravels(s, 1.0, 20.0, 2.0).y() == Approx(15 - 1 - 20 * std::sin(degToRad(10))));
}

TEST_CASE("a compound follows a cone only in the two senses that match it", "[compound]") {
    // derived: moving toward the chuck must go out where the cone grows toward the chuck.
    Tool right;
    right.hand = Hand::R;
    struct Case {
        Widens along;
        Across across;
        Widens widens;
        bool parallel, trailing;
    };
    const Case cases[] = {
        {Widens::TowardChuck, Across::Out, Widens::TowardChuck, true, false},
        {Widens::TowardTailstock, Across::In, Widens::TowardChuck, true, true},
        {Widens::TowardChuck, Across::In, Widens::TowardChuck, false, false},
        {Widens::TowardTailstock, Across::Out, Widens::TowardChuck, false, false},
        {Widens::TowardChuck, Across::In, Widens::TowardTailstock, true, false},
        {Widens::TowardTailstock, Across::Out, Widens::TowardTailstock, true, true},
        {Widens::TowardChuck, Across::Out, Widens::TowardTailstock, false, false},
        {Widens::TowardTailstock, Across::In, Widens::TowardTailstock, false, false},
    };
    for (const Case& c : cases) {
        const CompoundFit f = compoundFitForCone(sense(c.along, c.across), right, cone(c.widens));
        INFO(compoundSenseWords(sense(c.along, c.across))
             << " on a cone widening toward the "
             << (c.widens == Widens::TowardChuck ? "chuck" : "tailstock"));
        CHECK(f.parallel == c.parallel);
        CHECK(f.trailingEdge == c.trailing);
        CHECK(f.message.empty() == (c.parallel && !c.trailing));
    }
    // What to change is said in the scene's own keys.
    const CompoundFit wrong = compoundFitForCone(sense(Widens::TowardChuck, Across::In), right,
                                                 cone(Widens::TowardChuck));
    CHECK(wrong.message.find("advance = \"chuck\", across = \"out\"") != std::string::npos);
    // A left-hand tool leads toward the tailstock: the other sense uses its main edge.
    Tool left = right;
    left.hand = Hand::L;
    CHECK(compoundFitForCone(sense(Widens::TowardTailstock, Across::In), left,
                             cone(Widens::TowardChuck))
              .trailingEdge == false);
    CHECK(
        compoundFitForCone(sense(Widens::TowardChuck, Across::Out), left, cone(Widens::TowardChuck))
            .trailingEdge == true);
}

TEST_CASE("each pass says which way it feeds and which edge cuts", "[compound]") {
    Scene s = barScene(30);
    s.setup = sense(Widens::TowardChuck, Across::Out);
    s.setup.compoundReadingRad = std::atan(0.05);
    s.setup.zeroDiameterMm = 30;
    Pass p;
    p.kind = PassKind::Compound;
    p.fromMm = 0;
    p.toMm = 40;
    FeedDirection d = passFeedDirection(s, p);
    CHECK(d.along == 1);
    CHECK(d.across == 1);
    CHECK(d.edge == FeedDirection::Edge::Main);
    CHECK(feedDirectionWords(d) == "feeds toward the chuck and out, main edge cutting");
    s.setup = sense(Widens::TowardTailstock, Across::In);
    s.setup.compoundReadingRad = std::atan(0.05);
    d = passFeedDirection(s, p);
    CHECK(d.along == -1);
    CHECK(d.across == -1);
    CHECK(d.edge == FeedDirection::Edge::Trailing);
    Pass plunge;
    plunge.kind = PassKind::CrossSlide;
    plunge.fromMm = 0;
    plunge.toMm = 2;
    CHECK(passFeedDirection(s, plunge).edge == FeedDirection::Edge::Plunge);
    Pass turn;
    turn.kind = PassKind::Saddle;
    turn.fromMm = 0;
    turn.toMm = 30;
    CHECK(passFeedDirection(s, turn).edge == FeedDirection::Edge::Main);
}

TEST_CASE("an angle read off the other scale is noted", "[compound]") {
    // derived: a scale graduated from the cross-slide reads 90° − θ (Source: references R5), so
    // 87° is what it shows for a 3° half angle; set on a scale from the axis it is a mistake.
    Feature f;
    f.kind = FeatureKind::Cone;
    f.cone = Cone{0, 20, degToRad(3), Widens::TowardChuck};
    f.angleToleranceRad = degToRad(0.05);
    Setup s;
    s.compoundScale = CompoundScale::FromAxis;
    s.compoundReadingRad = degToRad(87);
    const auto note = otherScaleNote(s, f);
    REQUIRE(note);
    CHECK(note->find("other scale") != std::string::npos);
    CHECK(note->find("3°00′00″") != std::string::npos);
    s.compoundReadingRad = degToRad(3);
    CHECK_FALSE(otherScaleNote(s, f));
    s.compoundReadingRad = degToRad(40); // off, but not the other scale's reading
    CHECK_FALSE(otherScaleNote(s, f));
    s.compoundScale = CompoundScale::FromCrossSlide;
    s.compoundReadingRad = degToRad(3); // 3° on a cross-slide scale sets 87° from the axis
    REQUIRE(otherScaleNote(s, f));
    CHECK(otherScaleNote(s, f)->find("scale = \"axis\"") != std::string::npos);
    s.compoundReadingRad = degToRad(87);
    CHECK_FALSE(otherScaleNote(s, f));
}
