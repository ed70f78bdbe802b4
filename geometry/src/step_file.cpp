#include "swarf/geometry/step_file.h"

#include "occt_support.h"
#include "swarf/io/output_file.h"

#include <BRep_Builder.hxx>
#include <IFSelect_ReturnStatus.hxx>
#include <Interface_Static.hxx>
#include <STEPControl_Reader.hxx>
#include <STEPControl_Writer.hxx>
#include <StepBasic_Product.hxx>
#include <StepData_StepModel.hxx>
#include <TCollection_HAsciiString.hxx>
#include <TopoDS_Compound.hxx>

#include <filesystem>
#include <mutex>

namespace swarf::geometry {
namespace {
// The translator's settings are process-wide statics: one translation at a time.
std::mutex& translatorMutex() {
    static std::mutex m;
    return m;
}

// The translator names products "<name> <n>"; give the new ones exactly the solid's name.
void nameNewProducts(STEPControl_Writer& writer, const std::string& name) {
    const Handle(StepData_StepModel) model = writer.Model();
    const Handle(TCollection_HAsciiString) text = new TCollection_HAsciiString(name.c_str());
    for (int i = 1; i <= model->NbEntities(); ++i) {
        const Handle(StepBasic_Product) product =
            Handle(StepBasic_Product)::DownCast(model->Value(i));
        if (product.IsNull() || product->Name()->IsSameString(text))
            continue;
        const TCollection_AsciiString current = product->Name()->String();
        // Products named earlier in this file carry another solid's name: leave them.
        if (current.Search((name + " ").c_str()) != 1)
            continue;
        product->SetName(text);
        product->SetId(text);
    }
}
} // namespace

void writeStep(const std::string& path, const std::vector<NamedSolid>& solids) {
    const std::string what = "writing STEP file " + path;
    io::PendingFile file(path);
    const std::string& tmp = file.tmpPath();
    {
        std::lock_guard lock(translatorMutex());
        guarded(what, [&] {
            STEPControl_Writer writer;
            Interface_Static::SetCVal("write.step.schema", "AP214IS");
            Interface_Static::SetCVal("write.step.unit", "MM");
            Interface_Static::SetIVal("write.precision.mode", 0);
            int written = 0;
            for (const NamedSolid& s : solids) {
                if (s.solid.empty())
                    continue;
                Interface_Static::SetCVal("write.step.product.name", s.name.c_str());
                const IFSelect_ReturnStatus st =
                    writer.Transfer(s.solid.impl().shape, STEPControl_AsIs);
                require(st == IFSelect_RetDone, what,
                        "the translator could not take the solid \"" + s.name + "\"");
                ++written;
                nameNewProducts(writer, s.name);
            }
            require(written > 0, what, "there is no solid to write");
            if (writer.Write(tmp.c_str()) != IFSelect_RetDone)
                throw OutputError("cannot write " + path + " (as " + tmp + ")");
        });
    }
    file.commit();
}

Solid readStep(const std::string& path) {
    const std::string what = "reading STEP file " + path;
    require(std::filesystem::is_regular_file(path), what, "no such file");
    std::lock_guard lock(translatorMutex());
    return guarded(what, [&] {
        STEPControl_Reader reader;
        require(reader.ReadFile(path.c_str()) == IFSelect_RetDone, what,
                "not a readable STEP file");
        const int roots = reader.TransferRoots();
        require(roots > 0, what, "the file has no shape");
        if (reader.NbShapes() == 1)
            return wrap(reader.Shape(1));
        TopoDS_Compound all;
        BRep_Builder builder;
        builder.MakeCompound(all);
        for (int i = 1; i <= reader.NbShapes(); ++i)
            builder.Add(all, reader.Shape(i));
        return wrap(all);
    });
}

} // namespace swarf::geometry
