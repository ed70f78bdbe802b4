#pragma once
// Private to geometry/src: the modeller's shape inside Solid, the mapping from our (z, x) to
// the modeller's frame, silencing the modeller's console output and turning its failures into
// swarf::GeometryError.
#include "swarf/geometry/solid.h"
#include "swarf/sim/error.h"

#include <Standard_Failure.hxx>
#include <TopoDS_Shape.hxx>
#include <gp_Pnt.hxx>

#include <string>
#include <utility>

namespace swarf::geometry {

struct Solid::Impl {
    TopoDS_Shape shape;
};

/// Wraps a shape into a Solid.
inline Solid wrap(const TopoDS_Shape& shape) {
    auto impl = std::make_shared<Solid::Impl>();
    impl->shape = shape;
    return Solid(std::move(impl));
}

/// Our tool-plane point (z, x) as a modeller point: X = x, Y = 0, Z = z.
inline gp_Pnt profilePoint(double zMm, double xMm) {
    return gp_Pnt(xMm, 0.0, zMm);
}

/// Removes the modeller's console printers once per process (its default messenger prints
/// progress and statistics to stdout). Safe to call from several threads.
void silenceModeller();

/// Runs `fn`, turning the modeller's exceptions into GeometryError("<what>: <message>").
/// swarf::Error passes through unchanged.
template <class Fn> auto guarded(const std::string& what, Fn&& fn) -> decltype(fn()) {
    silenceModeller();
    try {
        return fn();
    } catch (const swarf::Error&) {
        throw;
    } catch (const Standard_Failure& e) {
        const char* msg = e.GetMessageString();
        throw GeometryError(what + ": the solid modeller failed (" + e.DynamicType()->Name() +
                            (msg && *msg ? std::string(": ") + msg : std::string()) + ")");
    } catch (const std::exception& e) {
        throw GeometryError(what + ": " + e.what());
    }
}

/// Throws GeometryError("<what>: <why>") unless `ok`.
inline void require(bool ok, const std::string& what, const std::string& why) {
    if (!ok)
        throw GeometryError(what + ": " + why);
}

/// Throws GeometryError unless `shape` passes the modeller's validity check.
void requireValid(const TopoDS_Shape& shape, const std::string& what);

} // namespace swarf::geometry
