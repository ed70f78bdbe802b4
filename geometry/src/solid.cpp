#include "swarf/geometry/solid.h"

#include "occt_support.h"

#include <BRepAdaptor_Curve.hxx>
#include <BRepAlgoAPI_Common.hxx>
#include <BRepAlgoAPI_Cut.hxx>
#include <BRepAlgoAPI_Section.hxx>
#include <BRepBndLib.hxx>
#include <BRepCheck_Analyzer.hxx>
#include <BRepGProp.hxx>
#include <Bnd_Box.hxx>
#include <GProp_GProps.hxx>
#include <IntCurvesFace_ShapeIntersector.hxx>
#include <Message.hxx>
#include <Message_Messenger.hxx>
#include <Message_PrinterOStream.hxx>
#include <TopExp_Explorer.hxx>
#include <TopoDS.hxx>
#include <gp_Lin.hxx>
#include <gp_Pln.hxx>

#include <algorithm>
#include <cmath>
#include <mutex>

namespace swarf::geometry {

void silenceModeller() {
    static std::once_flag once;
    std::call_once(once, [] {
        const Handle(Message_Messenger)& messenger = Message::DefaultMessenger();
        // Keep any printer a host program installed, but make it report failures only.
        for (Message_SequenceOfPrinters::Iterator it(messenger->Printers()); it.More(); it.Next())
            it.Value()->SetTraceLevel(Message_Fail);
        messenger->RemovePrinters(STANDARD_TYPE(Message_PrinterOStream));
    });
}

void requireValid(const TopoDS_Shape& shape, const std::string& what) {
    require(!shape.IsNull(), what, "the solid modeller returned no shape");
    BRepCheck_Analyzer check(shape);
    require(check.IsValid() == Standard_True, what,
            "the solid modeller made an invalid solid (its validity check failed)");
}

Solid::Solid() = default;
Solid::Solid(std::shared_ptr<const Impl> impl) : impl_(std::move(impl)) {}

bool Solid::empty() const {
    return solidCount() == 0;
}

int Solid::solidCount() const {
    if (!impl_ || impl_->shape.IsNull())
        return 0;
    int n = 0;
    for (TopExp_Explorer ex(impl_->shape, TopAbs_SOLID); ex.More(); ex.Next())
        ++n;
    return n;
}

double Solid::volumeMm3() const {
    if (empty())
        return 0.0;
    return guarded("volume of a solid", [&] {
        GProp_GProps props;
        // Adaptive integration to a relative error of 1e-9: the STEP round trip is checked
        // against the kernel's volume at 1e-6.
        BRepGProp::VolumeProperties(impl_->shape, props, 1e-9, Standard_True);
        return props.Mass();
    });
}

bool Solid::isValid() const {
    if (!impl_ || impl_->shape.IsNull())
        return false;
    return guarded("validity check", [&] {
        BRepCheck_Analyzer check(impl_->shape);
        return check.IsValid() == Standard_True;
    });
}

BoxMm Solid::bounds() const {
    require(!empty(), "bounding box", "the solid is empty");
    return guarded("bounding box", [&] {
        Bnd_Box box;
        BRepBndLib::AddOptimal(impl_->shape, box, Standard_False, Standard_False);
        BoxMm b;
        box.Get(b.xMin, b.yMin, b.zMin, b.xMax, b.yMax, b.zMax);
        return b;
    });
}

namespace {
// Farthest crossing of the ray from the axis along +X at height z with the solid's faces.
std::optional<double> rayRadius(const TopoDS_Shape& shape, double zMm) {
    IntCurvesFace_ShapeIntersector ray;
    ray.Load(shape, 1e-9);
    ray.Perform(gp_Lin(gp_Pnt(0, 0, zMm), gp_Dir(1, 0, 0)), -1e-9, 1e9);
    if (!ray.IsDone() || ray.NbPnt() == 0)
        return std::nullopt;
    double best = -1;
    for (int i = 1; i <= ray.NbPnt(); ++i)
        best = std::max(best, ray.WParameter(i));
    return best;
}

// Outermost point of the section by the plane Z = z (for planes through a flat end face,
// where the ray runs inside a face).
std::optional<double> sectionRadius(const TopoDS_Shape& shape, double zMm) {
    const std::string what = "section at z = " + std::to_string(zMm) + " mm";
    BRepAlgoAPI_Section section(shape, gp_Pln(gp_Pnt(0, 0, zMm), gp_Dir(0, 0, 1)), Standard_False);
    section.ComputePCurveOn1(Standard_False);
    section.Approximation(Standard_False);
    section.SetRunParallel(Standard_False);
    section.Build();
    require(section.IsDone() == Standard_True && !section.HasErrors(), what, "the modeller failed");
    double best = -1.0;
    for (TopExp_Explorer ex(section.Shape(), TopAbs_EDGE); ex.More(); ex.Next()) {
        BRepAdaptor_Curve curve(TopoDS::Edge(ex.Current()));
        const double u0 = curve.FirstParameter(), u1 = curve.LastParameter();
        // Section edges of a solid of revolution are circles about Z: a few samples suffice;
        // more are taken for anything else (a solid that is not round).
        const int n = curve.GetType() == GeomAbs_Circle ? 4 : 64;
        for (int k = 0; k <= n; ++k) {
            const gp_Pnt p = curve.Value(u0 + (u1 - u0) * k / n);
            best = std::max(best, std::hypot(p.X(), p.Y()));
        }
    }
    if (best < 0)
        return std::nullopt;
    return best;
}
} // namespace

std::optional<double> Solid::radiusAtZ(double zMm) const {
    if (empty())
        return std::nullopt;
    return guarded("radius at z = " + std::to_string(zMm) + " mm", [&]() -> std::optional<double> {
        // Solids of revolution: the ray in the XZ plane is enough and much faster than a
        // section of B-spline faces; the section is the fallback where the ray finds nothing.
        if (auto r = rayRadius(impl_->shape, zMm))
            return r;
        return sectionRadius(impl_->shape, zMm);
    });
}

Solid Solid::minus(const Solid& other) const {
    if (empty() || other.empty())
        return *this;
    return guarded("boolean difference", [&] {
        BRepAlgoAPI_Cut op(impl_->shape, other.impl_->shape);
        require(op.IsDone() == Standard_True && !op.HasErrors(), "boolean difference",
                "the modeller could not subtract the solids");
        return wrap(op.Shape());
    });
}

Solid Solid::common(const Solid& other) const {
    if (empty() || other.empty())
        return Solid();
    return guarded("boolean common", [&] {
        BRepAlgoAPI_Common op(impl_->shape, other.impl_->shape);
        require(op.IsDone() == Standard_True && !op.HasErrors(), "boolean common",
                "the modeller could not intersect the solids");
        return wrap(op.Shape());
    });
}

} // namespace swarf::geometry
