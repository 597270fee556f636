#include "check_banner.hpp"

#include "sheet_text.hpp"

#include "netcheck/model/wording.hpp"

namespace sheet {

using netcheck::plural;

CheckBanner checkBanner(const netcheck::CheckReport& report) {
    if (!report.ok()) {
        return {CheckBanner::Tone::Failed,
                "CHECK FAILED: " + plural(report.errors.size(), "error") +
                    ". Do not build this layout until they are fixed (findings listed below)."};
    }
    std::string warnings = report.warnings.empty()
                               ? ""
                               : ", " + plural(report.warnings.size(), "warning") + " to look at";
    if (!report.hasCircuit) {
        return {CheckBanner::Tone::Caution, "CHECKED WITHOUT A CIRCUIT: no board faults found" +
                                                warnings +
                                                ", but nothing was compared with a schematic."};
    }
    return {report.warnings.empty() ? CheckBanner::Tone::Passed : CheckBanner::Tone::Caution,
            "CHECK PASSED: the layout matches its circuit" + warnings + "."};
}

double drawCheckBanner(cairo_t* cr, const Rect& area, const CheckBanner& banner) {
    const double height = 6.0;
    Rgb fill = banner.tone == CheckBanner::Tone::Failed    ? Rgb{0.62, 0.08, 0.08}
               : banner.tone == CheckBanner::Tone::Caution ? Rgb{1.0, 0.86, 0.45}
                                                           : Rgb{0.80, 0.93, 0.80};
    Rgb ink = banner.tone == CheckBanner::Tone::Failed ? Rgb{1, 1, 1} : kInk;
    setColour(cr, fill);
    cairo_rectangle(cr, area.x, area.y, area.w, height);
    cairo_fill(cr);
    setColour(cr, ink);
    setFont(cr, kBodyMm, Weight::Bold);
    drawText(cr, area.x + 2.0, area.y + height / 2 + 0.95, fitText(cr, banner.text, area.w - 4.0));
    return height;
}

}  // namespace sheet
