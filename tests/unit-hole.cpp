// Hole names: row letters in spreadsheet style (A..Z, AA..AZ, BA..), hole numbers from 1.
#include <doctest/doctest.h>

#include "netcheck/model/hole.hpp"

using namespace netcheck;

TEST_CASE("hole names") {
    SUBCASE("row letters") {
        // Spreadsheet column lettering (bijective base 26), as the board file format specifies.
        CHECK(rowName(0) == "A");
        CHECK(rowName(1) == "B");
        CHECK(rowName(25) == "Z");
        CHECK(rowName(26) == "AA");
        CHECK(rowName(51) == "AZ");
        CHECK(rowName(52) == "BA");
        CHECK(rowName(701) == "ZZ");   // 26 + 26*26 - 1
        CHECK(rowName(702) == "AAA");  // the first three-letter name
        CHECK(rowName(999) == "ALL");  // 999 = 1*676 + 12*26 + 12 - 1 in letters A=1..Z=26
    }

    SUBCASE("hole names both ways") {
        // "A1" is top-left; "C12" is strip C, hole 12.
        CHECK(holeName({0, 0}) == "A1");
        CHECK(holeName({2, 11}) == "C12");
        CHECK(holeName({26, 0}) == "AA1");
        CHECK(holeName({52, 99}) == "BA100");
        CHECK(parseHole("A1") == Hole{0, 0});
        CHECK(parseHole("C12") == Hole{2, 11});
        CHECK(parseHole("AZ3") == Hole{51, 2});
        CHECK(parseHole("BA1") == Hole{52, 0});
        for (int row = 0; row < 1000; row += 7) {
            for (int col : {0, 1, 9, 99, 999}) {
                CAPTURE(row);
                CAPTURE(col);
                CHECK(parseHole(holeName({row, col})) == Hole{row, col});
            }
        }
    }

    SUBCASE("names are read in any case") {
        CHECK(parseHole("c12") == Hole{2, 11});
        CHECK(parseHole("aA7") == Hole{26, 6});
        CHECK(parseHole("bz2") == parseHole("BZ2"));
    }

    SUBCASE("malformed names are refused") {
        for (const char* bad : {"", "A", "12", "3C", "A0", "A-1", "A+1", " A1", "A1 ", "A 1", "A1B",
                                "A1.5", "Ä1", "A12345678", "ABCDE1", "_1", "A١"}) {
            CAPTURE(bad);
            CHECK_FALSE(parseHole(bad).has_value());
        }
    }

    SUBCASE("holes order by row, then column") {
        CHECK(Hole{0, 5} < Hole{1, 0});
        CHECK(Hole{1, 0} < Hole{1, 1});
    }
}
