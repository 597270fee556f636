// Putting the sheet together: plan the pages, open a PDF or SVG surface in millimetres, draw the
// board pages, then flow the lists.
#include "sheet.hpp"

#include <algorithm>
#include <cctype>
#include <functional>
#include <sstream>

#include <cairo-pdf.h>
#include <cairo-svg.h>
#include <cairo.h>

#include "board_view.hpp"
#include "calibration_bar.hpp"
#include "cautions.hpp"
#include "check_banner.hpp"
#include "netcheck/check/check.hpp"
#include "netcheck/file/file_io.hpp"
#include "netcheck/repair/finding_fixes.hpp"
#include "page_flow.hpp"
#include "page_layout.hpp"
#include "page_map.hpp"
#include "sheet_content.hpp"
#include "sheet_lists.hpp"
#include "sheet_text.hpp"

namespace sheet {

namespace {

using netcheck::Board;

enum class Format { Pdf, Svg };

std::optional<Format> formatOf(const std::string& path) {
    std::string lower = path;
    std::transform(lower.begin(), lower.end(), lower.begin(),
                   [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
    auto endsWith = [&](const char* tail) {
        std::string t(tail);
        return lower.size() > t.size() && lower.compare(lower.size() - t.size(), t.size(), t) == 0;
    };
    if (endsWith(".pdf")) return Format::Pdf;
    if (endsWith(".svg")) return Format::Svg;
    return std::nullopt;
}

/// Everything the pages are drawn from, computed once.
struct SheetData {
    const Board& board;
    SheetPlan plan;
    netcheck::CheckReport report;
    std::vector<netcheck::Cut> cuts;
    netcheck::BenchVoltagesResult voltages;
    int pageCount = 0;
};

constexpr double kListHeaderMm = 12.0;
constexpr double kListFooterMm = 6.0;

Rect listArea(const SheetPlan& plan) {
    const Rect& c = plan.content;
    return {c.x, c.y + kListHeaderMm, c.w, c.h - kListHeaderMm - kListFooterMm};
}

/// Draws a board page's header: title, size, the check banner, and the page map when split.
void drawBoardHeader(cairo_t* cr, const SheetData& data, const ViewPlacement& firstView) {
    const Rect& area = data.plan.frame.header;
    double mapWidth = data.plan.split ? 48.0 : 0.0;
    double textWidth = area.w - mapWidth - (mapWidth > 0 ? 3.0 : 0.0);
    setColour(cr, kInk);
    setFont(cr, kTitleMm, Weight::Bold);
    std::string title = data.board.title.empty() ? "Untitled board" : data.board.title;
    drawText(cr, area.x, area.y + kTitleMm, fitText(cr, title, textWidth));
    setFont(cr, kBodyMm);
    std::string facts = "Board " + boardSizeText(data.board) + " · " +
                        std::to_string(data.board.cuts.size()) + " cuts · printed at 1:1";
    drawText(cr, area.x, area.y + 9.5, fitText(cr, facts, textWidth));
    drawCheckBanner(cr, {area.x, area.y + 11.5, textWidth, 6.0}, checkBanner(data.report));
    if (data.plan.split) {
        setFont(cr, kSmallMm, Weight::Bold);
        drawText(cr, area.x, area.y + 21.0,
                 fitText(cr,
                         "The board is split over " + std::to_string(data.plan.boardPageCount) +
                             " pages: trim and lay them edge to edge so the shaded overlaps match.",
                         textWidth));
        drawPageMap(cr, {area.right() - mapWidth, area.y, mapWidth, area.h - 1.0}, data.plan,
                    firstView);
    }
}

void drawBoardPage(cairo_t* cr, const SheetData& data, int pageIndex) {
    const ViewPlacement* first = nullptr;
    for (const ViewPlacement& view : data.plan.views) {
        if (view.pageIndex != pageIndex) continue;
        if (!first) first = &view;
        drawBoardView(cr, ViewContext{data.board, data.plan, view, data.cuts});
    }
    if (first) drawBoardHeader(cr, data, *first);
    drawCalibrationBar(cr, data.plan.frame.calibration, data.plan.pitchMm);
    drawCautions(cr, data.plan.frame.cautions);
    drawPageFooter(cr, data.plan.content, data.board.title, pageIndex, data.pageCount);
}

void drawListHeader(cairo_t* cr, const SheetData& data, int pageIndex) {
    const Rect& c = data.plan.content;
    setColour(cr, kInk);
    setFont(cr, kHeadingMm + 0.6, Weight::Bold);
    std::string title = data.board.title.empty() ? "Untitled board" : data.board.title;
    drawText(cr, c.x, c.y + 4.5, fitText(cr, title + " — parts and lists", c.w));
    drawPageFooter(cr, c, "low-voltage circuits only; cautions on page 1", pageIndex,
                   data.pageCount);
}

/// Room left under the views of the last board page, when it is worth filling with lists.
std::optional<Rect> roomOnLastBoardPage(const SheetPlan& plan) {
    double bottom = plan.frame.views.y;
    for (const ViewPlacement& view : plan.views) {
        if (view.pageIndex == plan.boardPageCount - 1) {
            bottom = std::max(bottom, view.board.bottom() + kViewBottomMm);
        }
    }
    Rect room{plan.content.x, bottom + 4.0, plan.content.w,
              plan.frame.calibration.y - 3.0 - (bottom + 4.0)};
    if (room.h < 40.0) return std::nullopt;
    return room;
}

/// How many pages the lists take (drawn once onto a scrap surface).
int countListPages(SheetData& data) {
    cairo_surface_t* scrap = cairo_image_surface_create(CAIRO_FORMAT_A8, 1, 1);
    cairo_t* cr = cairo_create(scrap);
    prepareText(cr);
    cairo_scale(cr, kPointsPerMm, kPointsPerMm);
    PageFlow flow(cr, roomOnLastBoardPage(data.plan), listArea(data.plan), [] {});
    drawLists(flow, data.board, data.report, data.cuts, data.voltages);
    int pages = flow.pageCount();
    cairo_destroy(cr);
    cairo_surface_destroy(scrap);
    return pages;
}

/// Places cairo's user space at the top-left of a page, in millimetres.
class PageSetter {
public:
    PageSetter(cairo_t* cr, Format format, double pageHeightMm)
        : cr_(cr), format_(format), pageHeightMm_(pageHeightMm) {}

    void begin(int pageIndex) {
        if (format_ == Format::Pdf && pageIndex > 0) cairo_show_page(cr_);
        cairo_identity_matrix(cr_);
        if (format_ == Format::Pdf) {
            cairo_scale(cr_, kPointsPerMm, kPointsPerMm);
            return;
        }
        // SVG: pages one under another, each on white.
        cairo_translate(cr_, 0, pageIndex * pageHeightMm_);
        cairo_set_source_rgb(cr_, 1, 1, 1);
        cairo_rectangle(cr_, 0, 0, 1e4, pageHeightMm_);
        cairo_fill(cr_);
    }

private:
    cairo_t* cr_;
    Format format_;
    double pageHeightMm_;
};

// Cairo hands the finished bytes over piece by piece; they are kept in memory and saved in one
// atomic step, so a failure never leaves a partial sheet behind.
cairo_status_t appendBytes(void* closure, const unsigned char* data, unsigned int length) {
    static_cast<std::string*>(closure)->append(reinterpret_cast<const char*>(data), length);
    return CAIRO_STATUS_SUCCESS;
}

cairo_surface_t* createSurface(Format format, std::string& bytes, const SheetData& data) {
    const PaperSize& paper = data.plan.paper;
    if (format == Format::Pdf) {
        return cairo_pdf_surface_create_for_stream(
            appendBytes, &bytes, paper.widthMm * kPointsPerMm, paper.heightMm * kPointsPerMm);
    }
    // Sized in millimetres so width/height read "210mm" and user units are millimetres.
    cairo_surface_t* surface = cairo_svg_surface_create_for_stream(
        appendBytes, &bytes, paper.widthMm, paper.heightMm * data.pageCount);
    cairo_svg_surface_set_document_unit(surface, CAIRO_SVG_UNIT_MM);
    return surface;
}

void drawSheet(cairo_t* cr, Format format, SheetData& data) {
    PageSetter pages(cr, format, data.plan.paper.heightMm);
    for (int page = 0; page < data.plan.boardPageCount; ++page) {
        pages.begin(page);
        drawBoardPage(cr, data, page);
    }
    int next = data.plan.boardPageCount;
    PageFlow flow(cr, roomOnLastBoardPage(data.plan), listArea(data.plan), [&] {
        pages.begin(next);
        drawListHeader(cr, data, next);
        ++next;
    });
    drawLists(flow, data.board, data.report, data.cuts, data.voltages);
}

std::string statusText(cairo_status_t status) {
    return cairo_status_to_string(status);
}

}  // namespace

bool isSheetPath(const std::string& outPath) {
    return formatOf(outPath).has_value();
}

std::optional<std::string> exportSheet(const Board& board, const SheetOptions& options,
                                       const std::string& outPath) {
    auto format = formatOf(outPath);
    if (!format) return "cannot tell the sheet format of \"" + outPath + "\": use .pdf or .svg";
    // Files are refused such a pitch when read; a board made in memory is held to the same
    // bounds, since cairo spends minutes on (or fails half-way through) a board metres wide.
    const netcheck::ReadLimits limits;
    if (!(board.pitchMm >= limits.minPitchMm && board.pitchMm <= limits.maxPitchMm)) {
        std::ostringstream message;
        message << "cannot draw the sheet \"" << outPath << "\": the hole pitch " << board.pitchMm
                << " mm is outside " << limits.minPitchMm << " to " << limits.maxPitchMm << " mm";
        return message.str();
    }
    netcheck::CheckReport report = netcheck::check(board);
    netcheck::suggestFixes(report, board);
    SheetData data{board, planSheet(board, options), std::move(report), numberedCuts(board),
                   netcheck::computeBenchVoltages(board, nullptr, {})};
    data.pageCount = data.plan.boardPageCount + countListPages(data);
    std::string bytes;
    cairo_surface_t* surface = createSurface(*format, bytes, data);
    cairo_t* cr = cairo_create(surface);
    prepareText(cr);
    drawSheet(cr, *format, data);
    cairo_status_t status = cairo_status(cr);
    cairo_destroy(cr);
    cairo_surface_finish(surface);
    if (status == CAIRO_STATUS_SUCCESS) status = cairo_surface_status(surface);
    cairo_surface_destroy(surface);
    if (status != CAIRO_STATUS_SUCCESS) {
        return "cannot draw the sheet \"" + outPath + "\": " + statusText(status);
    }
    netcheck::SaveOptions save;
    save.keepBackup = false;  // a sheet is made again from the board at any time
    return netcheck::saveFileAtomically(outPath, bytes, save);
}

}  // namespace sheet
