// How a part's body is drawn, from its kind and drawing hints (part.extra).
#pragma once

#include <string>

#include "netcheck/model/board.hpp"

namespace stripsmith {

enum class BodyStyle {
    Resistor, CeramicCap, FilmCap, Electrolytic, Diode, Led, ToPackage, Dip, Trimmer, Header,
    Generic
};

/// Body style: by kind, refined by part.extra["package"] ("ceramic", "film", "dip", "to-92").
BodyStyle bodyStyleOf(const netcheck::Part& part);

/// True when a two-lead part stands on end: part.extra["body"] == "standing", or an axial part
/// (resistor, diode) whose leads are one hole apart.
bool isStanding(const netcheck::Part& part);

/// The pinout label of a three-lead part ("E-B-C"): extra["pinout"], else its pin names joined.
std::string pinoutLabel(const netcheck::Part& part);

}  // namespace stripsmith
