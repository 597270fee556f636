#include "editor/canvas/canvas_labels.hpp"

#include <algorithm>
#include <cmath>

#include "editor/canvas/part_style.hpp"

namespace stripsmith {

namespace {

using netcheck::Part;

struct Point {
    double x = 0, y = 0;
};

Point centreOf(netcheck::Hole h) { return {h.col + 0.5, h.row + 0.5}; }

Point pinCentroid(const Part& part) {
    Point sum;
    for (const netcheck::Pin& pin : part.pins) {
        sum.x += centreOf(pin.hole).x;
        sum.y += centreOf(pin.hole).y;
    }
    const double n = static_cast<double>(std::max<std::size_t>(part.pins.size(), 1));
    return {sum.x / n, sum.y / n};
}

int pinIndex(const Part& part, std::initializer_list<const char*> names) {
    for (std::size_t i = 0; i < part.pins.size(); ++i)
        for (const char* n : names)
            if (part.pins[i].name == n) return static_cast<int>(i);
    return -1;
}

/// Gathers labels with their first choices, sized in board units.
class Gatherer {
public:
    Gatherer(const CanvasLabelView& view, const MeasureText& measure) : view_(view), measure_(measure) {}

    /// `firstDx`, `firstDy`: the first choice's centre from the anchor, as seen on screen, in
    /// pitches (the copper side turns right into left).
    void add(CanvasLabel::Kind kind, std::string text, float sizePx, Point anchor, double firstDx,
             double firstDy, int owner) {
        const ImVec2 px = measure_(text, sizePx);
        const double w = (px.x + 2 * kLabelPadPx) / view_.holePx;
        const double h = px.y / view_.holePx;
        const double dx = view_.mirrored ? -firstDx : firstDx;
        requests.push_back({anchor.x, anchor.y, anchor.x + dx, anchor.y + firstDy, w, h, owner});
        CanvasLabel label;
        label.kind = kind;
        label.text = std::move(text);
        label.sizePx = sizePx;
        label.anchorX = anchor.x;
        label.anchorY = anchor.y;
        found.push_back(std::move(label));
    }
    double width(const std::string& text, float sizePx) const {
        return (measure_(text, sizePx).x + 2 * kLabelPadPx) / view_.holePx;
    }
    double height(const std::string& text, float sizePx) const {
        return measure_(text, sizePx).y / view_.holePx;
    }

    std::vector<labels::Label> requests;
    std::vector<CanvasLabel> found;

private:
    const CanvasLabelView& view_;
    const MeasureText& measure_;
};

/// The reference (and a chip's value) above the body, or on a dark body (chips, transistors).
void addPartName(Gatherer& g, const Part& part, int owner, float size) {
    const BodyStyle style = bodyStyleOf(part);
    const bool dark = style == BodyStyle::Dip || style == BodyStyle::ToPackage;
    std::string text = part.ref;
    if (style == BodyStyle::Dip && !part.value.empty()) text += " " + part.value;
    g.add(CanvasLabel::Kind::PartName, std::move(text), size, pinCentroid(part), 0,
          dark ? 0.0 : -0.65, owner);
}

/// "+" and "-" (or "A" and "K" on an LED) up and to the right of the leads of a polarised
/// round body.
void addPolarity(Gatherer& g, const Part& part, int owner, float size, double holePx) {
    const BodyStyle style = bodyStyleOf(part);
    if (part.pins.size() != 2 || (style != BodyStyle::Electrolytic && style != BodyStyle::Led))
        return;
    const int cathode = pinIndex(part, {"K", "-"});
    if (cathode < 0) return;
    const bool led = style == BodyStyle::Led;
    const auto plus = part.pins[static_cast<std::size_t>(1 - cathode)].hole;
    const auto minus = part.pins[static_cast<std::size_t>(cathode)].hole;
    const double em = size / holePx;  // the font size in pitches
    for (auto [hole, text] : {std::pair{plus, led ? "A" : "+"}, std::pair{minus, led ? "K" : "-"}}) {
        const double w = g.width(text, size), h = g.height(text, size);
        g.add(CanvasLabel::Kind::Polarity, text, size, centreOf(hole), 0.3 * em + w / 2,
              -1.1 * em + h / 2, owner);
    }
}

/// Each pin's name up and to the right of its pin.
void addPinNames(Gatherer& g, const Part& part, int owner, float size) {
    for (const netcheck::Pin& pin : part.pins) {
        const double w = g.width(pin.name, size), h = g.height(pin.name, size);
        g.add(CanvasLabel::Kind::PinName, pin.name, size, centreOf(pin.hole), 0.22 + w / 2,
              -h / 2 - 0.1, owner);
    }
}

// How far beyond the screen a label, pin or body still counts: a label in view may sit this far
// from its part.
constexpr double kBeyondShown = 4.0;

labels::Box grown(const labels::Box& box, double by) {
    return {box.x0 - by, box.y0 - by, box.x1 + by, box.y1 + by};
}

bool near(const CanvasLabelView& view, const Part& part) {
    if (!view.shown) return true;
    const labels::Box reach = grown(*view.shown, kBeyondShown);
    return std::any_of(part.pins.begin(), part.pins.end(), [&](const netcheck::Pin& pin) {
        return reach.contains(labels::boxAround(pin.hole.col + 0.5, pin.hole.row + 0.5, 0, 0));
    });
}

template <class T, class BoxOf>
std::vector<T> within(std::vector<T> items, const std::optional<labels::Box>& shown, BoxOf boxOf) {
    if (!shown) return items;
    const labels::Box reach = grown(*shown, 2 * kBeyondShown);
    std::erase_if(items, [&](const T& item) { return !reach.overlaps(boxOf(item)); });
    return items;
}

}  // namespace

float labelTextSize(float holePx, float pitchFraction) {
    const float size = holePx * pitchFraction;
    if (size < 8.0f) return 0.0f;
    return std::min(size, 28.0f);
}

std::vector<CanvasLabel> canvasLabels(const netcheck::Board& board, const CanvasLabelView& view,
                                      const MeasureText& measure) {
    Gatherer g(view, measure);
    const float nameSize = labelTextSize(view.holePx, 0.5f);
    const bool detailed = view.holePx >= 14.0f;
    // Pin names first (they belong right at their pins), then part names, then polarity marks.
    const float pinSize = std::max(12.0f, labelTextSize(view.holePx, 0.45f));
    for (std::size_t i = 0; i < board.parts.size(); ++i) {
        const Part& part = board.parts[i];
        const bool byZoom = view.holePx >= 36.0f && bodyStyleOf(part) == BodyStyle::ToPackage;
        if (((view.hoveredPart && *view.hoveredPart == i) || byZoom) && near(view, part))
            addPinNames(g, part, static_cast<int>(i), pinSize);
    }
    if (view.bodies && nameSize > 0) {
        const int parts = static_cast<int>(board.parts.size());
        if (detailed)
            for (int i = 0; i < parts; ++i)
                if (!board.parts[i].pins.empty() && near(view, board.parts[i]))
                    addPartName(g, board.parts[i], i, nameSize);
        for (int i = 0; i < parts; ++i)
            if (near(view, board.parts[i])) addPolarity(g, board.parts[i], i, nameSize, view.holePx);
    }
    // Off other parts' bodies where the bodies are drawn.
    if (g.requests.empty()) return {};
    const auto bodies = within(view.bodies ? labels::partBodies(board) : std::vector<labels::Body>{},
                               view.shown, [](const labels::Body& body) { return body.box; });
    const auto obstacles = within(labels::boardObstacles(board), view.shown,
                                  [](const labels::Box& box) { return box; });
    const auto placements =
        labels::placeLabels(g.requests, obstacles, labels::boardArea(board), bodies);
    for (std::size_t i = 0; i < g.found.size(); ++i) g.found[i].placement = placements[i];
    return std::move(g.found);
}

}  // namespace stripsmith
