// SPICE deck import: deck rules, numbers, terminal order, subcircuits, annotations and errors.
// Rules are from the ngspice manual (ch. 2, "Circuit description", and the element chapters) and
// the SPICE3 deck rules they follow; how Debian's ngspice 39 reads 4K7 and 2M2 was checked by
// running it (see also unit-spice-ngspice.cpp, which compares with ngspice directly).
#include <doctest/doctest.h>

#include <algorithm>
#include <random>
#include <string>
#include <vector>

#include "netcheck/spice/spice_import.hpp"
#include "netcheck/spice/spice_number.hpp"
#include "netcheck/model/value.hpp"
#include "test_support.hpp"

using netcheck::Circuit;
using netcheck::PinRef;
using netcheck::SpiceOptions;

namespace {

netcheck::ReadResult<Circuit> importText(const std::string& text,
                                         const SpiceOptions& options = {}) {
    return netcheck::importSpice(text, "deck.cir", options);
}

Circuit imported(const std::string& text, const SpiceOptions& options = {}) {
    auto result = importText(text, options);
    if (!result.ok()) FAIL("import failed: " << result.error->describe());
    return *result.value;
}

std::string netOf(const Circuit& circuit, const std::string& ref, const std::string& pin) {
    return circuit.netOf(PinRef{ref, pin}).value_or("(none)");
}

std::vector<std::string> pinsOf(const Circuit& circuit, const std::string& ref) {
    return circuit.parts.at(ref).pins;
}

/// The located error of a deck that must not load: "deck.cir:LINE: message".
std::string errorOf(const std::string& text, const SpiceOptions& options = {}) {
    auto result = importText(text, options);
    CHECK_FALSE(result.ok());
    CHECK_FALSE(result.value.has_value());  // nothing half-loaded
    return result.error ? result.error->describe() : "(no error)";
}

bool hasNote(const netcheck::ReadResult<Circuit>& result, const std::string& part) {
    return std::any_of(result.notes.begin(), result.notes.end(),
                       [&](const std::string& n) { return n.find(part) != std::string::npos; });
}

// Relative 1e-9, as sameValue compares values.
bool near(double a, double b) {
    return std::abs(a - b) <= 1e-9 * std::max(std::abs(a), std::abs(b));
}

double spiceValue(const std::string& field) {
    const auto n = netcheck::spice::parseSpiceNumber(field);
    REQUIRE_MESSAGE(n.has_value(), field);
    return n->value;
}

}  // namespace

TEST_CASE("spice numbers") {
    SUBCASE("scale suffixes (ngspice manual, ch. 2: T G MEG K M U N P F MIL)") {
        CHECK(near(spiceValue("1T"), 1e12));
        CHECK(near(spiceValue("1G"), 1e9));
        CHECK(near(spiceValue("1MEG"), 1e6));
        CHECK(near(spiceValue("1K"), 1e3));
        CHECK(near(spiceValue("1M"), 1e-3));  // milli in SPICE, unlike board files
        CHECK(near(spiceValue("1U"), 1e-6));
        CHECK(near(spiceValue("1N"), 1e-9));
        CHECK(near(spiceValue("1P"), 1e-12));
        CHECK(near(spiceValue("1F"), 1e-15));
        CHECK(near(spiceValue("1MIL"), 25.4e-6));
    }
    SUBCASE("suffixes are case-insensitive (ngspice manual, ch. 2)") {
        CHECK(near(spiceValue("2.2meg"), 2.2e6));
        CHECK(near(spiceValue("2.2Meg"), 2.2e6));
        CHECK(near(spiceValue("100n"), 100e-9));
        CHECK(near(spiceValue("4.7k"), 4700));
        CHECK(near(spiceValue("1m"), spiceValue("1M")));
    }
    SUBCASE(
        "letters after a number or suffix are ignored (ngspice manual, ch. 2: 10, 10V, 10Volts)") {
        CHECK(near(spiceValue("10"), 10));
        CHECK(near(spiceValue("10V"), 10));
        CHECK(near(spiceValue("10Volts"), 10));
        CHECK(near(spiceValue("10Kohm"), 10e3));
        CHECK(near(spiceValue("1mH"), 1e-3));
        CHECK(near(spiceValue("10uF"), 10e-6));
    }
    SUBCASE("mantissa forms: exponent, leading point, sign (SPICE3 rules)") {
        CHECK(near(spiceValue("1e3"), 1000));
        CHECK(near(spiceValue("1.5e3k"), 1.5e6));
        CHECK(near(spiceValue(".5"), 0.5));
        CHECK(near(spiceValue("-2.5u"), -2.5e-6));
        CHECK(near(spiceValue("1E-2meg"), 1e4));
    }
    SUBCASE("letter-and-digit codes read the SPICE way, with the IEC 60062 reading kept") {
        // REFERENCE: ngspice 39 (Debian) reads 4K7 as 4000, 2k5 as 2000, 4R7 as 4, 2M2 as 0.002;
        // IEC 60062: 4K7 = 4.7 kOhm, 2M2 = 2.2 MOhm, 4R7 = 4.7 Ohm.
        const auto k = netcheck::spice::parseSpiceNumber("4K7");
        REQUIRE(k);
        CHECK(near(k->value, 4000));
        REQUIRE(k->iecReading);
        CHECK(near(*k->iecReading, 4700));
        const auto m = netcheck::spice::parseSpiceNumber("2M2");
        REQUIRE(m);
        CHECK(near(m->value, 0.002));
        REQUIRE(m->iecReading);
        CHECK(near(*m->iecReading, 2.2e6));
        CHECK(near(spiceValue("2k5"), 2000));
        const auto r = netcheck::spice::parseSpiceNumber("4R7");
        REQUIRE(r);
        CHECK(near(r->value, 4));
        REQUIRE(r->iecReading);
        CHECK(near(*r->iecReading, 4.7));
        CHECK_FALSE(netcheck::spice::parseSpiceNumber("4.7k")->iecReading);
        CHECK_FALSE(netcheck::spice::parseSpiceNumber("10Kohm")->iecReading);
    }
    SUBCASE("not numbers") {
        CHECK_FALSE(netcheck::spice::parseSpiceNumber(""));
        CHECK_FALSE(netcheck::spice::parseSpiceNumber("k10"));
        CHECK_FALSE(netcheck::spice::parseSpiceNumber("1.2.3"));
        CHECK_FALSE(netcheck::spice::parseSpiceNumber("10%"));
        CHECK_FALSE(netcheck::spice::parseSpiceNumber("2k$x"));
    }
    SUBCASE("written numbers read back to the same value") {
        for (double v : {4700.0, 2.2e6, 1e-3, 100e-9, 0.47, 1.0 / 3, 5e12, 3.3e-12, 1.0, 0.0}) {
            CAPTURE(v);
            const std::string text = netcheck::spice::formatSpiceNumber(v, 12);
            CAPTURE(text);
            CHECK(near(spiceValue(text), v));
        }
        CHECK(netcheck::spice::formatSpiceNumber(4700) == "4.7k");
        CHECK(netcheck::spice::formatSpiceNumber(2.2e6) == "2.2meg");
        CHECK(netcheck::spice::formatSpiceNumber(1e-3) == "1m");
    }
}

TEST_CASE("spice deck lines") {
    SUBCASE(
        "the first line is the title even when it looks like an element (ngspice manual, ch. 2)") {
        const Circuit c = imported("R9 a b 1k\nR1 a b 1k\n.end\n");
        CHECK(c.parts.size() == 1);
        CHECK(c.parts.count("R1") == 1);
    }
    SUBCASE("star comments, also indented") {
        const Circuit c = imported("t\n* R2 a b 1k\n   * R3 a b 1k\nR1 a b 1k\n");
        CHECK(c.parts.size() == 1);
    }
    SUBCASE("end-of-line comments: `$` after a blank, `//` and `;` (ngspice)") {
        const Circuit c = imported(
            "t\nR1 a b 1k $ R9 x y\nR2 a b 2k // R8 x y\nR3 a b 3k;R7 x y\nR4 a b 4k $x\n");
        CHECK(c.parts.size() == 4);
        CHECK(c.parts.at("R2").value == "2k");
        CHECK(c.parts.at("R4").value == "4k");
        // `2k$x` has no blank before `$`: ngspice reads it as a malformed value, so do we.
        CHECK(errorOf("t\nR1 a b 2k$x\n") == "deck.cir:2: bad number \"2k$x\"");
    }
    SUBCASE("`+` continues the line before, across comment lines and after leading blanks") {
        const Circuit c = imported("t\nR1 a\n* note\n+ b\n  + 1k\nC1 a\n+ b 1n\n");
        CHECK(netOf(c, "R1", "2") == "b");
        CHECK(c.parts.at("R1").value == "1k");
        CHECK(c.parts.at("C1").value == "1n");
        CHECK(errorOf("t\n+ a b 1k\n") ==
              "deck.cir:2: continuation line (+) with no line before it to continue");
    }
    SUBCASE("fields are separated by blanks , = ( ) (ngspice manual, ch. 2)") {
        const Circuit c = imported("t\nR1 a,b 1k\nR2 (a b) 2k\nR3 a b r=3k\n");
        CHECK(netOf(c, "R1", "2") == "b");
        CHECK(netOf(c, "R2", "1") == "a");
        CHECK(c.parts.at("R3").value == "3k");
    }
    SUBCASE("case-insensitive: names and nodes (ngspice manual, ch. 2)") {
        const Circuit c = imported("t\nr1 OUT in 1K\nR2 out IN 1k\n");
        CHECK(c.parts.count("R1") == 1);
        CHECK(netOf(c, "R1", "1") == netOf(c, "R2", "1"));
        CHECK(netOf(c, "R1", "1") == "OUT");  // the first spelling names the net
        CHECK(errorOf("t\nr1 a b 1k\nR1 a c 1k\n") ==
              "deck.cir:3: duplicate element name R1 (first on line 2)");
    }
    SUBCASE(".end ends the deck; other dot-commands are noted") {
        const auto result =
            importText("t\nR1 a b 1k\n.tran 1u 1m\n.option TEMP=27\n.end\nR2 a b 1k\n");
        REQUIRE(result.ok());
        CHECK(result.value->parts.size() == 1);
        CHECK(hasNote(result, "deck.cir:3: .tran ignored"));
        CHECK(hasNote(result, "deck.cir:4: .option ignored"));
    }
    SUBCASE(".control blocks are left out") {
        const auto result =
            importText("t\nR1 a b 1k\n.control\nR5 a b 1k\nrun\n.endc\nR2 a b 1k\n");
        REQUIRE(result.ok());
        CHECK(result.value->parts.size() == 2);
        CHECK(hasNote(result, "deck.cir:3: .control block ignored"));
    }
    SUBCASE("CRLF line ends") {
        const Circuit c = imported("t\r\nR1 a b 1k\r\n+ \r\nC1 a b 1u\r\n.end\r\n");
        CHECK(c.parts.size() == 2);
        CHECK(netOf(c, "C1", "2") == "b");
    }
}

TEST_CASE("spice elements") {
    SUBCASE("R, C, L: n+ n- value -> pins 1, 2 (ngspice manual, ch. 3)") {
        const Circuit c = imported("t\nR1 a b 4.7K\nC1 b c 100n\nL1 c d 10mH\n");
        CHECK(c.parts.at("R1").kind == "resistor");
        CHECK(c.parts.at("C1").kind == "capacitor");
        CHECK(c.parts.at("L1").kind == "inductor");
        CHECK(pinsOf(c, "R1") == std::vector<std::string>{"1", "2"});
        CHECK(netOf(c, "R1", "1") == "a");
        CHECK(netOf(c, "R1", "2") == "b");
        CHECK(netOf(c, "L1", "2") == "d");
    }
    SUBCASE("values compare numerically with board values (board rules: IEC 60062, M mega)") {
        const Circuit c =
            imported("t\nR1 a b 4.7K\nC1 b c 100n\nL1 c d 10mH\nR2 a b 1M\nR3 a b 2.2MEG\n");
        CHECK(netcheck::sameValue(c.parts.at("R1").value, "4k7"));
        CHECK(netcheck::sameValue(c.parts.at("C1").value, "100nF"));
        CHECK(netcheck::sameValue(c.parts.at("L1").value, "10mH"));
        // SPICE 1M is one milliohm: it must not become the board's 1M (mega).
        CHECK_FALSE(netcheck::sameValue(c.parts.at("R2").value, "1M"));
        CHECK(netcheck::parseQuantity(c.parts.at("R2").value)->magnitude == doctest::Approx(1e-3));
        CHECK(netcheck::sameValue(c.parts.at("R3").value, "2M2"));
    }
    SUBCASE("4K7 and 2M2 read the SPICE way, with a note giving the IEC reading") {
        const auto result = importText("amp\nR1 a b 4K7\nR2 a b 2M2\nR3 a b 4.7k\n");
        REQUIRE(result.ok());
        CHECK(netcheck::sameValue(result.value->parts.at("R1").value, "4k"));
        CHECK(netcheck::sameValue(result.value->parts.at("R2").value, "2m"));
        CHECK(hasNote(result,
                      "deck.cir:2: value \"4K7\" reads as 4000 under SPICE rules (4.7k if "
                      "meant as IEC 60062 code 4K7)"));
        CHECK(hasNote(result,
                      "deck.cir:3: value \"2M2\" reads as 0.002 under SPICE rules (2.2meg "
                      "if meant as IEC 60062 code 2M2)"));
        CHECK(result.notes.size() == 2);
    }
    SUBCASE("D: anode cathode model -> pins A, K, value = model (ngspice manual, diodes)") {
        const Circuit c = imported("t\nD1 an ca 1N4148\n");
        CHECK(c.parts.at("D1").kind == "diode");
        CHECK(c.parts.at("D1").value == "1N4148");
        CHECK(netOf(c, "D1", "A") == "an");
        CHECK(netOf(c, "D1", "K") == "ca");
    }
    SUBCASE("Q: collector base emitter [substrate] model (ngspice manual, BJTs)") {
        const Circuit c = imported(
            "t\nQ1 c b e BC547\nQ2 c b e s qmod\nQ3 c b e qmod 2.0\n.model qmod npn\n.model BC547 "
            "npn\n");
        CHECK(c.parts.at("Q1").kind == "bjt");
        CHECK(pinsOf(c, "Q1") == std::vector<std::string>{"C", "B", "E"});
        CHECK(c.parts.at("Q1").value == "BC547");
        CHECK(netOf(c, "Q1", "C") == "c");
        CHECK(netOf(c, "Q1", "E") == "e");
        CHECK(pinsOf(c, "Q2") == std::vector<std::string>{"C", "B", "E", "S"});
        CHECK(netOf(c, "Q2", "S") == "s");
        CHECK(pinsOf(c, "Q3") == std::vector<std::string>{"C", "B", "E"});  // 2.0 is the area
        CHECK(c.parts.at("Q3").value == "qmod");
    }
    SUBCASE("J: drain gate source model; M: drain gate source bulk model (ngspice manual)") {
        const Circuit c = imported("t\nJ1 d g s J201\nM1 d g s b BS170\nM2 d g s s BS170\n");
        CHECK(c.parts.at("J1").kind == "jfet");
        CHECK(netOf(c, "J1", "D") == "d");
        CHECK(netOf(c, "J1", "S") == "s");
        CHECK(c.parts.at("M1").kind == "mosfet");
        CHECK(pinsOf(c, "M1") == std::vector<std::string>{"D", "G", "S", "B"});
        CHECK(netOf(c, "M1", "B") == "b");
        // Bulk joined to source: a discrete three-lead MOSFET.
        CHECK(pinsOf(c, "M2") == std::vector<std::string>{"D", "G", "S"});
    }
    SUBCASE("X: nodes then subcircuit name; pins named by the .subckt ports") {
        const Circuit c = imported(
            "t\nX1 in out 0 amp\nXU2 a b c amp gain=2\n.subckt amp inp OUTP gnd\nR1 inp OUTP "
            "1k\n.ends\n");
        CHECK(c.parts.at("X1").kind == "ic");
        CHECK(c.parts.at("X1").value == "amp");
        CHECK(pinsOf(c, "X1") == std::vector<std::string>{"inp", "OUTP", "gnd"});
        CHECK(netOf(c, "X1", "OUTP") == "out");
        CHECK(netOf(c, "X1", "gnd") == "GND");
        // X followed by a letter-led ref, as schematic programs write subcircuit parts.
        CHECK(c.parts.count("U2") == 1);
        CHECK(c.parts.count("X1.R1") == 0);  // not flattened
    }
    SUBCASE("node 0 and gnd are ground, named by the option") {
        const Circuit c = imported("t\nR1 a 0 1k\nR2 a GND 1k\n");
        CHECK(netOf(c, "R1", "2") == "GND");
        CHECK(netOf(c, "R2", "2") == "GND");
        SpiceOptions options;
        options.groundName = "0V";
        CHECK(netOf(imported("t\nR1 a 0 1k\nR2 a gnd 1k\n", options), "R2", "2") == "0V");
    }
    SUBCASE("V and I sources: ignored by default, V as an off-board supply on request") {
        const std::string deck = "t\nR1 vcc 0 1k\nV1 vcc 0 DC 9\nI1 vcc 0 1m\n";
        const auto ignored = importText(deck);
        REQUIRE(ignored.ok());
        CHECK(ignored.value->parts.size() == 1);
        CHECK(hasNote(ignored, "deck.cir:3: V1 (vcc to 0) ignored"));
        CHECK(hasNote(ignored, "deck.cir:4: I1 (vcc to 0) ignored"));
        SpiceOptions options;
        options.sources = SpiceOptions::Sources::Offboard;
        const auto supply = importText(deck, options);
        REQUIRE(supply.ok());
        CHECK(supply.value->parts.at("V1").kind == "battery");
        CHECK(supply.value->parts.at("V1").value == "9V");
        CHECK(netOf(*supply.value, "V1", "+") == "vcc");
        CHECK(netOf(*supply.value, "V1", "-") == "GND");
        CHECK(supply.value->parts.count("I1") == 0);
        CHECK(hasNote(supply, "deck.cir:3: V1 read as an off-board supply"));
    }
    SUBCASE("element letters with no board part are noted and left out") {
        const auto result = importText("t\nR1 a b 1k\nE1 a b c d 10\nK1 L1 L2 0.9\n");
        REQUIRE(result.ok());
        CHECK(result.value->parts.size() == 1);
        CHECK(hasNote(result, "deck.cir:3: E1 ignored"));
    }
    SUBCASE("values that are not numbers are kept as text with a note") {
        const auto result = importText("t\nR1 a b {rval}\n.param rval=1k\n");
        REQUIRE(result.ok());
        CHECK(result.value->parts.at("R1").value == "{rval}");
        CHECK(hasNote(result, "not a number"));
    }
}

TEST_CASE("spice errors") {
    SUBCASE("too few nodes") {
        CHECK(errorOf("t\nR1 a 1k\n") ==
              "deck.cir:2: element R1 has too few fields (Rname n+ n- value)");
        CHECK(errorOf("t\nQ1 c b qmod\n") ==
              "deck.cir:2: element Q1 has too few fields (Qname collector base emitter [substrate] "
              "model)");
        CHECK(errorOf("t\nD1 a b\n") ==
              "deck.cir:2: element D1 has too few fields (Dname anode "
              "cathode model)");
        CHECK(errorOf("t\nM1 d g s nmos\n") ==
              "deck.cir:2: element M1 has too few fields (Mname drain gate source bulk model)");
    }
    SUBCASE("bad numbers") {
        CHECK(errorOf("t\nR1 a b 1.2.3k\n") == "deck.cir:2: bad number \"1.2.3k\"");
        CHECK(errorOf("t\nC1 a b 10%\n") == "deck.cir:2: bad number \"10%\"");
    }
    SUBCASE("subcircuits: unknown, wrong node count, recursive, unterminated, stray .ends") {
        CHECK(errorOf("t\nX1 a b nothere\n") ==
              "deck.cir:2: unknown subcircuit nothere called by X1");
        CHECK(errorOf("t\nX1 a b c s\n.subckt s p q\nR1 p q 1k\n.ends\n") ==
              "deck.cir:2: X1 gives 3 nodes but .subckt s (line 3) has 2 ports");
        CHECK(errorOf("t\nX1 a b s\n.subckt s p q\nX2 p q s\n.ends\n") ==
              "deck.cir:4: recursive subcircuit: s -> s");
        CHECK(
            errorOf(
                "t\nX1 a b s\n.subckt s p q\nX2 p q u\n.ends\n.subckt u p q\nX3 p q s\n.ends\n") ==
            "deck.cir:7: recursive subcircuit: s -> u -> s");
        CHECK(errorOf("t\nX1 a b s\n.subckt s p q\nR1 p q 1k\n") ==
              "deck.cir:3: .subckt s has no .ends");
        CHECK(errorOf("t\nR1 a b 1k\n.ends\n") == "deck.cir:3: .ends without a .subckt");
        CHECK(errorOf("t\n.subckt s p\nR1 p 0 1\n.ends\n.subckt S q\nR1 q 0 1\n.ends\nX1 a s\n") ==
              "deck.cir:5: subcircuit S defined twice (first on line 2)");
    }
    SUBCASE("an empty deck") {
        CHECK(errorOf("just a title\n") ==
              "deck.cir: the deck has no parts (is the first line the title?)");
    }
    SUBCASE("size limit") {
        netcheck::ReadLimits limits;
        limits.maxBytes = 10;
        const auto result =
            netcheck::importSpice("t\nR1 a b 1k\nR2 a b 1k\n", "deck.cir", {}, limits);
        CHECK_FALSE(result.ok());
        limits = {};
        limits.maxParts = 3;
        const auto many = netcheck::importSpice(
            "t\nX1 a b s\nX2 a b s\n.subckt s p q\nR1 p q 1\nR2 p q 1\n.ends\n", "deck.cir",
            SpiceOptions{"GND", true}, limits);
        CHECK_FALSE(many.ok());
    }
    SUBCASE("the part limit is checked as the elements are read, on the line that passes it") {
        netcheck::ReadLimits limits;
        limits.maxParts = 3;
        const auto result = netcheck::importSpice(
            "t\nR1 a b 1k\nR2 a b 1k\nR3 a b 1k\nR4 a b 1k\nR5 a b 1k\n", "deck.cir", {}, limits);
        REQUIRE(result.error.has_value());
        CHECK(result.error->describe() == "deck.cir:5: more than 3 elements in the deck");
    }
    SUBCASE("100,000 elements: a duplicate name on the last line is found") {
        std::string deck = "t\n";
        for (int i = 1; i <= 99999; ++i) deck += "R" + std::to_string(i) + " a b 1k\n";
        deck += "r77 a b 1k\n";  // element names are case-insensitive (ngspice manual)
        CHECK(errorOf(deck) == "deck.cir:100001: duplicate element name r77 (first on line 78)");
    }
}

TEST_CASE("spice flattening") {
    const std::string deck =
        "t\n"
        "X1 in out amp\n"
        ".subckt amp i o\n"
        "R1 i n 10k\n"
        "X2 n o buf\n"
        "C1 n 0 1u\n"
        ".ends amp\n"
        ".subckt buf a b\n"
        "Rb a b 1k\n"
        "Rg b gnd 1meg\n"
        ".ends\n";
    SpiceOptions flat;
    flat.flatten = true;
    const Circuit c = imported(deck, flat);
    SUBCASE("hierarchical refs like ngspice's r.x1.r1 without the letter") {
        CHECK(c.parts.size() == 4);
        CHECK(c.parts.count("X1.R1") == 1);
        CHECK(c.parts.count("X1.C1") == 1);
        CHECK(c.parts.count("X1.X2.RB") == 1);
        CHECK(c.parts.count("X1.X2.RG") == 1);
    }
    SUBCASE("ports join the caller's nodes; local nodes get the instance path; ground is global") {
        CHECK(netOf(c, "X1.R1", "1") == "in");
        CHECK(netOf(c, "X1.R1", "2") == "X1.n");
        CHECK(netOf(c, "X1.X2.RB", "1") == "X1.n");
        CHECK(netOf(c, "X1.X2.RB", "2") == "out");
        CHECK(netOf(c, "X1.X2.RG", "2") == "GND");
        CHECK(netOf(c, "X1.C1", "2") == "GND");
    }
    SUBCASE("two instances keep their local nodes apart") {
        const Circuit two =
            imported("t\nX1 a b s\nX2 b c s\n.subckt s p q\nR1 p m 1k\nR2 m q 1k\n.ends\n", flat);
        CHECK(netOf(two, "X1.R1", "2") == "X1.m");
        CHECK(netOf(two, "X2.R1", "2") == "X2.m");
        CHECK(netOf(two, "X1.R2", "2") == netOf(two, "X2.R1", "1"));
    }
    SUBCASE(".global nodes are shared by every instance") {
        const Circuit g =
            imported("t\n.global vcc\nX1 a s\n.subckt s p\nR1 p vcc 1k\n.ends\nR2 vcc 0 1\n", flat);
        CHECK(netOf(g, "X1.R1", "2") == netOf(g, "R2", "1"));
    }
    SUBCASE("calls of empty subcircuits stay parts") {
        const Circuit s =
            imported("t\nXJ1 tip 0 jack\nR1 tip 0 1k\n.subckt jack T S\n.ends\n", flat);
        CHECK(s.parts.at("J1").kind == "ic");
        CHECK(netOf(s, "J1", "T") == "tip");
    }
}

TEST_CASE("spice annotations") {
    SUBCASE("*@pot: two resistors sharing the wiper node make one pot, lugs 1, 2, 3") {
        const Circuit c = imported("t\nRa in wip 7k\nRb wip 0 3k\n*@pot VR1 = Ra Rb taper=log\n");
        CHECK(c.parts.count("RA") == 0);
        CHECK(c.parts.count("RB") == 0);
        const auto& pot = c.parts.at("VR1");
        CHECK(pot.kind == "pot");
        CHECK(pot.pins == std::vector<std::string>{"1", "2", "3"});
        CHECK(netcheck::sameValue(pot.value, "10k log"));
        CHECK(netOf(c, "VR1", "1") == "in");
        CHECK(netOf(c, "VR1", "2") == "wip");
        CHECK(netOf(c, "VR1", "3") == "GND");
        // Order of the resistors on the annotation decides lug 1 and lug 3.
        const Circuit swapped = imported("t\nRa in wip 7k\nRb wip 0 3k\n*@pot VR1 Rb Ra\n");
        CHECK(netOf(swapped, "VR1", "1") == "GND");
        CHECK(netcheck::sameValue(swapped.parts.at("VR1").value, "10k"));
    }
    SUBCASE("*@pot errors") {
        CHECK(errorOf("t\nRa a b 1k\nRb c d 1k\n*@pot VR1 = Ra Rb\n") ==
              "deck.cir:4: *@pot: Ra and Rb must share exactly one node (the wiper)");
        CHECK(errorOf("t\nRa a b 1k\n*@pot VR1 = Ra Rz\n") ==
              "deck.cir:3: *@pot: no element Rz here");
        CHECK(errorOf("t\nRa a b 1k\nC1 b c 1n\n*@pot VR1 = Ra C1\n") ==
              "deck.cir:4: *@pot: C1 is not a resistor");
    }
    SUBCASE("*@kind: electrolytic takes pins +, - in SPICE order; LEDs keep A, K") {
        const auto result = importText(
            "t\nC3 out 0 100u\n*@kind C3 electrolytic\nD1 a k LED\n*@kind d1 led\n*@kind R1 "
            "gizmo\nR1 a b 1\n");
        REQUIRE(result.ok());
        const Circuit& c = *result.value;
        CHECK(c.parts.at("C3").kind == "electrolytic");
        CHECK(pinsOf(c, "C3") == std::vector<std::string>{"+", "-"});
        CHECK(netOf(c, "C3", "+") == "out");
        CHECK(netOf(c, "C3", "-") == "GND");
        CHECK(c.parts.at("D1").kind == "led");
        CHECK(pinsOf(c, "D1") == std::vector<std::string>{"A", "K"});
        CHECK(c.parts.at("R1").kind == "gizmo");
        CHECK(hasNote(result, "deck.cir:6: *@kind: \"gizmo\" is not a known part kind"));
    }
    SUBCASE("*@pins, *@value, *@ref, *@net") {
        const Circuit c = imported(
            "t\nXU1 a b 0 reg\n.subckt reg p1 p2 p3\n.ends\n*@pins XU1 IN OUT GND\n*@kind XU1 "
            "regulator\n"
            "D1 a b x\n*@value D1\nR1 a b 4.7k\n*@value R1 4.7 kOhm\n*@ref R1 Rload\n"
            "*@net a V+\n*@net b\n");
        CHECK(pinsOf(c, "U1") == std::vector<std::string>{"IN", "OUT", "GND"});
        CHECK(c.parts.at("U1").kind == "regulator");
        CHECK(c.parts.at("D1").value.empty());
        CHECK(c.parts.at("Rload").value == "4.7 kOhm");
        CHECK(netOf(c, "Rload", "1") == "V+");
        CHECK(netOf(c, "U1", "OUT") == "(none)");  // `*@net b` with no name: left unconnected
        CHECK(c.nets.count("b") == 0);
    }
    SUBCASE("*@value that contradicts the deck is noted, the deck wins") {
        const auto result = importText("t\nR1 a b 4.7k\n*@value R1 47k\n");
        REQUIRE(result.ok());
        CHECK(netcheck::sameValue(result.value->parts.at("R1").value, "4k7"));
        CHECK(hasNote(result, "deck.cir:3: *@value \"47k\" for R1 does not match"));
    }
    SUBCASE("annotations inside a subcircuit apply to each flattened instance") {
        SpiceOptions flat;
        flat.flatten = true;
        const Circuit c = imported(
            "t\nX1 a 0 s\nX2 b 0 s\n.subckt s p q\nC1 p q 10u\n*@kind C1 electrolytic\n.ends\n",
            flat);
        CHECK(c.parts.at("X1.C1").kind == "electrolytic");
        CHECK(netOf(c, "X2.C1", "+") == "b");
    }
    SUBCASE("malformed annotations are errors; unknown words are notes") {
        CHECK(errorOf("t\nR1 a b 1k\n*@kind R1\n") ==
              "deck.cir:3: *@kind: expected *@kind NAME kind");
        CHECK(errorOf("t\nR1 a b 1k\n*@kind R2 led\n") == "deck.cir:3: *@kind: no element R2 here");
        CHECK(errorOf("t\nX1 a s\n.subckt s p\nR1 p 0 1\n*@kind R9 led\n.ends\n") ==
              "deck.cir:5: *@kind: no element R9 here");
        CHECK(errorOf("t\nR1 a b 1k\n*@pins R1 x\n") ==
              "deck.cir:3: *@pins: R1 has 2 pins, 1 names given");
        const auto result = importText("t\nR1 a b 1k\n*@author me\n");
        REQUIRE(result.ok());
        CHECK(hasNote(result, "deck.cir:3: *@author is not an annotation we know"));
    }
    SUBCASE("two refs that end up equal are an error") {
        CHECK(errorOf("t\nXR1 a b s\nR1 a b 1k\n.subckt s p q\n.ends\n") ==
              "deck.cir:3: part ref R1 (from R1) is used twice (also line 2)");
    }
}

TEST_CASE("spice deck detection") {
    CHECK(netcheck::looksLikeSpiceDeck("{}", "amp.cir"));
    CHECK(netcheck::looksLikeSpiceDeck("x", "amp.SP"));
    CHECK(netcheck::looksLikeSpiceDeck("title\nR1 a b 1k", "amp.txt"));
    CHECK_FALSE(netcheck::looksLikeSpiceDeck("  {\"parts\": {}}", "amp.txt"));
    CHECK_FALSE(netcheck::looksLikeSpiceDeck("title", "amp.circuit.json"));
}

TEST_CASE("spice damaged decks") {
    // Random edits of real decks (fixed seed): every result is either a whole circuit whose nets
    // name only declared pins of its parts, or one located error; never a crash or half a circuit.
    std::vector<std::string> decks;
    for (const char* folder : {"samples/spice", "tests/spice/decks"}) {
        for (const std::string& file : test_support::sourceFiles(folder, ".cir")) {
            decks.push_back(test_support::readTextFile(file));
        }
    }
    REQUIRE(decks.size() >= 6);
    std::mt19937 random(5150);
    const std::string alphabet = " \n+*.$;=(){},0xXrRkKmM@/\t7";
    for (int round = 0; round < 3000; ++round) {
        CAPTURE(round);
        std::string text = decks[random() % decks.size()];
        for (unsigned edit = 0; edit < 1 + random() % 4; ++edit) {
            const std::size_t at = random() % (text.size() + 1);
            switch (random() % 4) {
                case 0:
                    text.erase(at, 1 + random() % 12);
                    break;
                case 1:
                    text.insert(at, 1, alphabet[random() % alphabet.size()]);
                    break;
                case 2:
                    text.insert(at, text.substr(random() % (text.size() + 1), random() % 40));
                    break;
                default:
                    text.resize(at);
                    break;
            }
        }
        netcheck::SpiceOptions options;
        options.flatten = random() % 2 == 0;
        const auto result = netcheck::importSpice(text, "damaged.cir", options);
        CHECK(result.ok() != result.error.has_value());
        if (result.error) {
            CHECK(result.error->file == "damaged.cir");
            CHECK_FALSE(result.error->message.empty());
            CHECK(result.error->line >= 0);
            CHECK(result.error->line <=
                  static_cast<int>(std::count(text.begin(), text.end(), '\n')) + 1);
            continue;
        }
        for (const auto& [net, pins] : result.value->nets) {
            for (const PinRef& pin : pins) {
                CAPTURE(pin.name());
                REQUIRE(result.value->parts.count(pin.ref) == 1);
                const auto& declared = result.value->parts.at(pin.ref).pins;
                CHECK(std::find(declared.begin(), declared.end(), pin.pin) != declared.end());
            }
        }
    }
}
