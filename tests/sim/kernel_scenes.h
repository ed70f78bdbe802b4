#pragma once
// Scenes built in code for the kernel tests (numbers here are made up for the tests, except
// where a check names its source).
#include "swarf/sim/scene.h"
#include "swarf/sim/units.h"

#include <cmath>
#include <utility>
#include <vector>

namespace swarf::testing {

/// A bar of the given diameter, 100 mm out of the jaws, faced at the datum (no allowance).
inline Scene barScene(double stockDiameterMm, double stickOutMm = 100.0) {
    Scene s;
    s.name = "test";
    s.stock.diameterMm = stockDiameterMm;
    s.stock.lengthMm = 200;
    s.stock.stickOutMm = stickOutMm;
    s.stock.faceAllowanceMm = 0;
    s.tool.shape = 'D';
    s.tool.includedAngleRad = degToRad(55);
    s.tool.enteringAngleRad = degToRad(93);
    s.tool.noseRadiusMm = 0.8;
    s.tool.hand = Hand::R;
    s.tool.edgeLengthMm = 11.6;
    s.sim.profileStepMm = 0.002;
    s.sim.angleSamples = 36;
    return s;
}

/// A cone feature from z0 to z1 with diameter d0 at z0, widening toward the chuck.
inline Feature coneFeature(double z0, double z1, double d0, double halfAngleRad, double tolMm) {
    Feature f;
    f.kind = FeatureKind::Cone;
    f.name = "cone";
    f.zStartMm = z0;
    f.zEndMm = z1;
    f.cone.gaugeZMm = z0;
    f.cone.gaugeDiameterMm = d0;
    f.cone.halfAngleRad = halfAngleRad;
    f.cone.widens = Widens::TowardChuck;
    f.toleranceMm = tolMm;
    f.angleToleranceRad = degToRad(0.5);
    return f;
}

/// A cylinder feature.
inline Feature cylinderFeature(double z0, double z1, double d, double tolMm) {
    Feature f;
    f.kind = FeatureKind::Cylinder;
    f.name = "cylinder";
    f.zStartMm = z0;
    f.zEndMm = z1;
    f.diameterMm = d;
    f.toleranceMm = tolMm;
    return f;
}

/// A CNC pass through imaginary-tip points (z, x radius).
inline Pass pathPass(std::vector<std::pair<double, double>> pts, double feed) {
    Pass p;
    p.kind = PassKind::Path;
    p.pathZX = std::move(pts);
    p.feedMmPerRev = feed;
    return p;
}

} // namespace swarf::testing
