// fourplat/fourplat.hpp — the umbrella header: every public header of the library.
#pragma once

#include "fourplat/error.hpp"
#include "fourplat/integer.hpp"
#include "fourplat/fraction.hpp"
#include "fourplat/continued_fraction.hpp"
#include "fourplat/tangle.hpp"
#include "fourplat/two_bridge.hpp"
#include "fourplat/algebraic.hpp"
