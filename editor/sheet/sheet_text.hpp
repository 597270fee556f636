// Text on the sheet: one font (DejaVu Sans, shipped in assets/fonts and installed by Debian's
// fonts-dejavu-core), sizes in millimetres, measured and aligned with cairo's toy text API.
#pragma once

#include <string>
#include <string_view>
#include <vector>

#include <cairo.h>

namespace sheet {

/// Font sizes in millimetres (1 pt = 0.3528 mm).
inline constexpr double kTitleMm = 5.0;
inline constexpr double kHeadingMm = 3.6;
inline constexpr double kBodyMm = 2.6;
inline constexpr double kSmallMm = 2.0;
inline constexpr double kTinyMm = 1.45;

enum class Weight { Normal, Bold };
enum class Align { Left, Centre, Right };

/// An RGB colour, each channel 0..1.
struct Rgb {
    double r = 0, g = 0, b = 0;
};
inline constexpr Rgb kInk{0.0, 0.0, 0.0};
inline constexpr Rgb kGreyInk{0.35, 0.35, 0.35};

void setColour(cairo_t* cr, Rgb colour);

/// Turns off hinting of glyph advances so that text measures the same on every surface (the
/// list pages are measured on a scrap surface before they are drawn).
void prepareText(cairo_t* cr);

/// Selects the sheet font at `sizeMm`.
void setFont(cairo_t* cr, double sizeMm, Weight weight = Weight::Normal);

/// Advance width of `text` in the current font.
double textWidth(cairo_t* cr, std::string_view text);

/// Draws `text` with its baseline at `y`, aligned on `x` by its advance width.
void drawText(cairo_t* cr, double x, double y, std::string_view text, Align align = Align::Left);

/// Draws `text` centred on (x, y) both ways (by advance width and by the font's cap height),
/// over a white box so it stays readable above holes and strips.
void drawLabel(cairo_t* cr, double x, double y, std::string_view text, Rgb ink = kInk);

/// Width and height of the white box `drawLabel` puts behind `text` in the current font.
struct LabelSize {
    double w = 0, h = 0;
};
LabelSize labelSize(cairo_t* cr, std::string_view text);

/// Splits `text` into lines no wider than `widthMm` in the current font (breaking at spaces; a
/// word longer than the width gets a line of its own).
std::vector<std::string> wrapText(cairo_t* cr, std::string_view text, double widthMm);

/// Shortens `text` with "…" until it fits `widthMm` in the current font.
std::string fitText(cairo_t* cr, std::string_view text, double widthMm);

}  // namespace sheet
