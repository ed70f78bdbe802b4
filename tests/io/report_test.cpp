// Tests of swarf/io/report.h: report.html.
#include "swarf/io/report.h"

#include "support/synthetic.h"

#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>
#include <sstream>

using namespace swarf;
namespace fs = std::filesystem;

TEST_CASE("report.html carries verdict, cautions, findings, pictures and passes", "[io][report]") {
    const Scene s = test::syntheticScene(3);
    const CutResult r =
        test::syntheticResult(s, [](int k) { return k == 2 ? 0.1 : 1.0 - 0.4 * k; });
    io::ReportPictures pics;
    pics.part = "/somewhere/part.png";
    pics.cone = "/somewhere/cone.png";
    pics.section = "/somewhere/section.png";
    pics.chart = "/somewhere/chart.png";
    const fs::path dir = fs::temp_directory_path() / "swarf-viewer-test-report";
    fs::remove_all(dir);
    const std::string path = io::writeReport(s, r, dir.string(), &pics);
    REQUIRE(fs::exists(path));
    CHECK_FALSE(fs::exists(path + ".tmp"));
    std::ifstream in(path);
    std::stringstream ss;
    ss << in.rdbuf();
    const std::string html = ss.str();
    CHECK(html.find("out of tolerance") != std::string::npos);
    CHECK(html.find("does not model cutting forces, deflection of the work or the tool, chatter") !=
          std::string::npos);
    CHECK(html.find("metal left on the cone") != std::string::npos);
    for (const char* img :
         {"src=\"part.png\"", "src=\"cone.png\"", "src=\"section.png\"", "src=\"chart.png\""})
        CHECK(html.find(img) != std::string::npos);
    for (const auto& p : s.plan.passes)
        CHECK(html.find(p.note) != std::string::npos);
    // readable offline: nothing fetched from elsewhere
    CHECK(html.find("<script") == std::string::npos);
    CHECK(html.find("http://") == std::string::npos);
    CHECK(html.find("https://") == std::string::npos);
    CHECK(html.find("<link") == std::string::npos);
}

TEST_CASE("report of a part within tolerance says so and escapes text", "[io][report]") {
    Scene s = test::syntheticScene(2);
    s.plan.passes[0].note = "Lock the saddle <then> wind & watch";
    const CutResult r = test::syntheticResult(s, [](int k) { return k == 1 ? 0.001 : 0.5; });
    const std::string html = io::reportHtml(s, r, nullptr);
    CHECK(html.find("within tolerance") != std::string::npos);
    CHECK(html.find("Lock the saddle &lt;then&gt; wind &amp; watch") != std::string::npos);
    CHECK(html.find("<img") == std::string::npos);
}

TEST_CASE("an inch scene's report gives volumes in cubic inches; a finding with no place a dash",
          "[io][report][units]") {
    Scene s = test::syntheticScene(2);
    s.units = Units::Inch;
    CutResult r = test::syntheticResult(s, [](int k) { return k == 1 ? 0.001 : 0.5; });
    r.stockVolumeMm3 = 16387.064; // one cubic inch (25.4³ mm³, exact by definition of the inch)
    Finding f;
    f.kind = FindingKind::AirCut;
    f.pass = 0;
    f.message = "cuts nothing";
    r.findings.push_back(f); // no place: zMm is NaN
    const std::string html = io::reportHtml(s, r, nullptr);
    CHECK(html.find("stock 1.00 in³") != std::string::npos);
    CHECK(html.find("mm³") == std::string::npos);
    CHECK(html.find("<td>—</td><td>cuts nothing</td>") != std::string::npos);
}
