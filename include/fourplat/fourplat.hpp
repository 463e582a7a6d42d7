// fourplat/fourplat.hpp — the umbrella header: every public header of the library except
// format.hpp (the {fmt} formatters, which pull in <fmt/format.h>; include it where you print).
#pragma once

#include "fourplat/error.hpp"
#include "fourplat/integer.hpp"
#include "fourplat/fraction.hpp"
#include "fourplat/continued_fraction.hpp"
#include "fourplat/tangle.hpp"
#include "fourplat/algebraic.hpp"
#include "fourplat/two_bridge.hpp"
#include "fourplat/coloring.hpp"
#include "fourplat/diagram.hpp"
#include "fourplat/pd.hpp"
#include "fourplat/svg.hpp"
#include "fourplat/counts.hpp"
#include "fourplat/enumerate.hpp"
#include "fourplat/families.hpp"
#include "fourplat/parse.hpp"
