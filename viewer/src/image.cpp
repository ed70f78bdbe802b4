// Reading PNG pictures back (tests, checks).
#include "swarf/viewer/image.h"

#include "swarf/sim/error.h"

#include <vtkImageData.h>
#include <vtkNew.h>
#include <vtkPNGReader.h>

#include <filesystem>

namespace swarf::viewer {

Image readPng(const std::string& path) {
    std::error_code ec;
    if (!std::filesystem::exists(path, ec))
        throw InputError(SourceLoc{path, 0, 0}, "file", path, "an existing PNG file");
    vtkNew<vtkPNGReader> reader;
    if (!reader->CanReadFile(path.c_str()))
        throw InputError(SourceLoc{path, 0, 0}, "file", path, "a PNG file");
    reader->SetFileName(path.c_str());
    reader->Update();
    vtkImageData* data = reader->GetOutput();
    int dims[3];
    data->GetDimensions(dims);
    const int comps = data->GetNumberOfScalarComponents();
    Image img;
    img.widthPx = dims[0];
    img.heightPx = dims[1];
    img.rgb.resize(static_cast<std::size_t>(dims[0]) * dims[1] * 3);
    const auto* src = static_cast<const unsigned char*>(data->GetScalarPointer());
    // VTK stores rows from the bottom.
    for (int y = 0; y < dims[1]; ++y)
        for (int x = 0; x < dims[0]; ++x) {
            const unsigned char* p = src + (static_cast<std::size_t>(y) * dims[0] + x) * comps;
            unsigned char* q =
                img.rgb.data() + 3 * (static_cast<std::size_t>(dims[1] - 1 - y) * dims[0] + x);
            for (int c = 0; c < 3; ++c)
                q[c] = comps >= 3 ? p[c] : p[0];
        }
    return img;
}

} // namespace swarf::viewer
