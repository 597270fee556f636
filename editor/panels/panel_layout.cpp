// The layout dialog. The engine runs on LayoutWorker; this file only asks, shows and accepts.
// End-to-end log: "note layout started", "note layout found N: 1 area A rows R cols C links L
// cuts K; 2 ...", "note layout found none: WHY", "note layout cancelled"; the accepted layout is
// the status line of its command ("Lay out from the circuit", "Place the remaining parts").
#include "editor/panels/panel_layout.hpp"

#include <algorithm>
#include <memory>
#include <string>

#include <imgui.h>

#include "editor/canvas/canvas_frame.hpp"
#include "editor/canvas/layers.hpp"
#include "editor/canvas/offboard_layout.hpp"
#include "netcheck/check/check.hpp"
#include "netcheck/model/board_size.hpp"
#include "netcheck/edit/replace_board.hpp"

namespace stripsmith {

namespace {

const char* title(const LayoutDialogState& s) {
    return s.placeTheRest ? "Place the remaining parts" : "Lay out from the circuit";
}

std::string scoreText(const netcheck::LayoutScore& s) {
    auto count = [](int n, const char* what) {
        return std::to_string(n) + " " + what + (n == 1 ? "" : "s");
    };
    return netcheck::sizeInHoles(s.cols, s.rows) + " (" + std::to_string(s.area()) + " in all), " +
           count(s.links, "link") + ", " + count(s.cuts, "cut");
}

void start(const LayoutDialogContext& c) {
    LayoutDialogState& s = c.state;
    const netcheck::Board& board = c.doc.board();
    LayoutRequest request;
    request.circuit = *board.circuit;
    if (s.placeTheRest) request.placed = board;
    request.options.seed = static_cast<std::uint64_t>(std::max(1, s.seed));
    request.options.iterations = std::max(1, s.iterations);
    request.options.rails = s.rails && !s.placeTheRest;
    s.results.clear();
    s.reports.clear();
    s.problem.clear();
    s.chosen = 0;
    s.startRevision = c.doc.revision();
    s.worker.start(std::move(request));
    c.log.note("layout started");
}

// The results of a finished run, each checked once for the preview.
void collect(const LayoutDialogContext& c) {
    LayoutDialogState& s = c.state;
    s.results = s.worker.takeResults();
    s.problem = s.worker.problem();
    for (const auto& result : s.results) s.reports.push_back(netcheck::check(result.board));
    if (s.results.empty()) {
        c.log.note("layout found none: " + s.problem);
        return;
    }
    std::string line = "layout found " + std::to_string(s.results.size()) + ":";
    for (std::size_t i = 0; i < s.results.size(); ++i) {
        const auto& score = s.results[i].score;
        line += (i ? "; " : " ") + std::to_string(i + 1) + " area " + std::to_string(score.area()) +
                " rows " + std::to_string(score.rows) + " cols " + std::to_string(score.cols) +
                " links " + std::to_string(score.links) + " cuts " + std::to_string(score.cuts) +
                " errors " + std::to_string(s.reports[i].errors.size());
    }
    c.log.note(line);
}

// The layout as it would replace the board: the maker's title, pitch and unknown keys kept.
netcheck::Board accepted(const netcheck::Board& now, netcheck::Board layout) {
    if (!now.title.empty()) layout.title = now.title;
    layout.pitchMm = now.pitchMm;
    layout.extra = now.extra;
    layout.boardExtra = now.boardExtra;
    return layout;
}

void accept(const LayoutDialogContext& c) {
    LayoutDialogState& s = c.state;
    const auto index = static_cast<std::size_t>(s.chosen);
    const netcheck::Board& now = c.doc.board();
    if (c.commands.perform(std::make_unique<netcheck::edit::ReplaceBoard>(
            now, accepted(now, s.results[index].board), title(s)))) {
        s.open = false;
        s.results.clear();
        s.reports.clear();
        // Nothing selected or pointed at survives: the elements are all new.
        c.selection.clear();
        c.view.focusedFinding.reset();
        c.view.previewStep.reset();
        c.view.fitPending = true;
    }
}

void drawPreview(const LayoutDialogContext& c, ImVec2 size) {
    const LayoutDialogState& s = c.state;
    const auto index = static_cast<std::size_t>(s.chosen);
    const netcheck::Board& board = s.results[index].board;
    ImGui::BeginChild("layout-preview", size, true);
    const ImVec2 min = ImGui::GetCursorScreenPos();
    const ImVec2 avail = ImGui::GetContentRegionAvail();
    const ImVec2 max{min.x + avail.x, min.y + avail.y};
    const bool mirrored = c.view.side == Side::Copper;
    const BoardTransform t =
        fitTransform(contentBounds(board, layoutOffboard(board), mirrored), min, max, board.cols, mirrored);
    ImDrawList* draw = ImGui::GetWindowDrawList();
    const Selected none;
    const LayerFrame f(makeCanvasFrame(draw, t, min, max, c.view.side, board), board, none,
                       s.reports[index]);
    draw->PushClipRect(min, max, true);
    drawBoard(f);  // as the canvas draws it
    draw->PopClipRect();
    ImGui::EndChild();
}

void drawOptions(const LayoutDialogContext& c) {
    LayoutDialogState& s = c.state;
    const netcheck::Board& board = c.doc.board();
    const std::size_t parts = board.circuit ? board.circuit->parts.size() : 0;
    if (s.placeTheRest)
        ImGui::TextWrapped("Keeps the %zu parts on the board exactly where they are and places the "
                           "circuit's other parts to their right, with new cuts, links and wires.",
                           board.parts.size());
    else
        ImGui::TextWrapped("Lays out the circuit's %zu parts on a new, trimmed board that passes "
                           "the check. The board you have now comes back with Undo.",
                           parts);
    if (!s.placeTheRest) {  // rails would move the placed parts down a strip
        ImGui::Checkbox("Supply rails on the top and bottom strips", &s.rails);
        c.log.item("layout-rails");
    }
    ImGui::SetNextItemWidth(120);
    ImGui::InputInt("Part orders tried per alternative", &s.iterations, 1000, 10000);
    s.iterations = std::clamp(s.iterations, 1, 10'000'000);
    ImGui::SetNextItemWidth(120);
    ImGui::InputInt("Seed (alternatives use the next two)", &s.seed);
    s.seed = std::max(1, s.seed);
    if (!s.problem.empty())
        ImGui::TextColored({1.0f, 0.5f, 0.45f, 1.0f}, "No layout: %s", s.problem.c_str());
    if (ImGui::Button("Start")) start(c);
    c.log.item("layout-start");
    ImGui::SameLine();
    if (ImGui::Button("Close")) s.open = false;
}

void drawRunning(const LayoutDialogContext& c, const LayoutStatus& status) {
    ImGui::ProgressBar(static_cast<float>(status.fraction), {-1, 0});
    if (status.best)
        ImGui::Text("Best so far: %s", scoreText(*status.best).c_str());
    else
        ImGui::TextDisabled("Ordering the parts...");
    if (ImGui::Button("Cancel")) {
        c.state.worker.cancel();
        c.log.note("layout cancelled");
    }
    c.log.item("layout-cancel");
}

void drawResults(const LayoutDialogContext& c) {
    LayoutDialogState& s = c.state;
    for (std::size_t i = 0; i < s.results.size(); ++i) {
        const std::string label = std::to_string(i + 1) + ": " + scoreText(s.results[i].score);
        if (ImGui::RadioButton(label.c_str(), s.chosen == static_cast<int>(i)))
            s.chosen = static_cast<int>(i);
        c.log.item("layout-alternative-" + std::to_string(i + 1));
    }
    const auto& bounds = s.results[static_cast<std::size_t>(s.chosen)].bounds;
    ImGui::TextDisabled("Lower bound: %d strips, %ld holes; the part order found needs %d strips "
                        "if no net changed strip.",
                        bounds.strips, bounds.area, bounds.orderStrips);
    const bool stale = c.doc.revision() != s.startRevision;
    const float buttons = ImGui::GetFrameHeightWithSpacing() * (stale ? 2.2f : 1.2f);
    drawPreview(c, {-1, -buttons});
    if (stale)
        ImGui::TextColored({1.0f, 0.75f, 0.3f, 1.0f},
                           "The board changed while this was laid out: start again to use it.");
    ImGui::BeginDisabled(stale);
    if (ImGui::Button("Accept")) accept(c);
    ImGui::EndDisabled();
    c.log.item("layout-accept");
    ImGui::SameLine();
    if (ImGui::Button("Start again")) start(c);
    ImGui::SameLine();
    if (ImGui::Button("Discard")) {
        s.results.clear();
        s.reports.clear();
        s.open = false;
    }
    c.log.item("layout-discard");
}

}  // namespace

void openLayoutDialog(LayoutDialogState& state, bool placeTheRest) {
    if (state.worker.status().running) state.worker.cancel();
    state.open = true;
    state.placeTheRest = placeTheRest;
    state.results.clear();
    state.reports.clear();
    state.problem.clear();
    if (state.iterations <= 0) state.iterations = static_cast<int>(defaultLayoutIterations());
}

void drawLayoutDialog(const LayoutDialogContext& c) {
    LayoutDialogState& s = c.state;
    LayoutStatus status = s.worker.status();
    if (status.finished) {
        collect(c);
        status = s.worker.status();
    }
    if (!s.open) {
        if (status.running) s.worker.cancel();  // closed with the window's own button
        return;
    }
    if (!c.doc.board().circuit) {  // the circuit was removed meanwhile
        s.open = false;
        return;
    }
    const ImVec2 display = ImGui::GetIO().DisplaySize;
    ImGui::SetNextWindowSize({std::min(760.0f, display.x * 0.9f), std::min(560.0f, display.y * 0.8f)},
                             ImGuiCond_Appearing);
    ImGui::SetNextWindowPos({display.x * 0.5f, display.y * 0.5f}, ImGuiCond_Appearing, {0.5f, 0.5f});
    const std::string name = std::string(title(s)) + "###layout-dialog";
    if (ImGui::Begin(name.c_str(), &s.open, ImGuiWindowFlags_NoCollapse)) {
        if (status.running)
            drawRunning(c, status);
        else if (!s.results.empty())
            drawResults(c);
        else
            drawOptions(c);
    }
    ImGui::End();
}

}  // namespace stripsmith
