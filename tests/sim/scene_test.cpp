// Tests of Scene::validate and the scene's geometry helpers, on scenes built in code.
#include "swarf/sim/scene.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <string>

using namespace swarf;

namespace {

Scene goodScene() {
    Scene s;
    s.file = "code.toml";
    s.stock.diameterMm = 30;
    s.stock.lengthMm = 150;
    s.stock.stickOutMm = 85;
    s.stock.material = "steel";
    s.stock.where = {"code.toml", 4, 1};
    Feature cone;
    cone.kind = FeatureKind::Cone;
    cone.name = "taper";
    cone.zStartMm = 0;
    cone.zEndMm = 50;
    cone.cone = Cone{40, 29, std::atan(0.05), Widens::TowardChuck};
    cone.toleranceMm = 0.02;
    cone.angleToleranceRad = degToRad(0.05);
    cone.where = {"code.toml", 10, 1};
    s.part.features.push_back(cone);
    s.tool.shape = 'D';
    s.tool.includedAngleRad = degToRad(55);
    s.tool.enteringAngleRad = degToRad(93);
    s.tool.noseRadiusMm = 0.4;
    s.setup.compoundReadingRad = std::atan(0.05);
    s.setup.zeroDiameterMm = 30;
    return s;
}

std::string validateMessage(const Scene& s) {
    try {
        s.validate();
    } catch (const InputError& e) {
        return e.what();
    }
    return "";
}

} // namespace

TEST_CASE("a good scene built in code validates", "[sim][scene]") {
    CHECK(validateMessage(goodScene()).empty());
}

TEST_CASE("validate names the key and the item's location", "[sim][scene]") {
    Scene s = goodScene();
    s.stock.stickOutMm = 200;
    CHECK(validateMessage(s).find("code.toml:4:1: stock.stick_out = 200") == 0);

    s = goodScene();
    s.part.features[0].cone.gaugeZMm = 60;
    CHECK(validateMessage(s).find("code.toml:10:1: part.feature[1].gauge_plane = 60") == 0);

    s = goodScene();
    s.setup.compoundReadingRad = degToRad(90);
    CHECK(validateMessage(s).find("setup.compound.angle = 90") != std::string::npos);

    s = goodScene();
    s.tool.enteringAngleRad = degToRad(130); // 130 + 55 ≥ 180
    CHECK(validateMessage(s).find("tool.entering_angle") != std::string::npos);

    s = goodScene();
    s.plan.passes.push_back(Pass{});
    s.plan.passes[0].feedMmPerRev = 0;
    s.plan.passes[0].toMm = 5;
    CHECK(validateMessage(s).find("plan.pass[1].feed = 0") != std::string::npos);

    // Values are shown in the scene's units.
    s = goodScene();
    s.units = Units::Inch;
    s.stock.stickOutMm = 254;
    CHECK(validateMessage(s).find("stock.stick_out = 10:") != std::string::npos);
}

TEST_CASE("compound angle from either scale", "[sim][scene]") {
    Setup su;
    su.compoundReadingRad = degToRad(14 + 2.0 / 60);
    CHECK(su.compoundAxisAngleRad() == Approx(degToRad(14 + 2.0 / 60)));
    // Source: references R5 (a scale graduated from the cross-slide reads 90° − θ)
    su.compoundScale = CompoundScale::FromCrossSlide;
    su.compoundReadingRad = degToRad(90 - 14 - 2.0 / 60);
    CHECK(su.compoundAxisAngleRad() == Approx(degToRad(14 + 2.0 / 60)));
    su.compoundErrorRad = degToRad(0.1);
    CHECK(su.compoundAxisAngleRad() == Approx(degToRad(14 + 2.0 / 60 + 0.1)));
}

TEST_CASE("feature radius, half angle and part extent", "[sim][scene]") {
    const Scene s = goodScene();
    const Feature& f = s.part.features[0];
    CHECK(f.radiusAt(40) == Approx(14.5));
    CHECK(f.radiusAt(0) == Approx(12.5)); // derived: 1:10 over 40 mm takes 4 mm off the diameter
    CHECK(f.surfaceHalfAngleRad() == Approx(std::atan(0.05)));
    CHECK(s.part.zMinMm() == 0);
    CHECK(s.part.zMaxMm() == 50);
    CHECK(s.part.nominalRadiusAt(25).value() == Approx(13.75));
    CHECK_FALSE(s.part.nominalRadiusAt(-1).has_value());
    CHECK(s.part.mainCone() == &s.part.features[0]);
    Part empty;
    CHECK(empty.mainCone() == nullptr);
}
