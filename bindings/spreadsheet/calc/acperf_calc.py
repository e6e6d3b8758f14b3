"""acperf functions for LibreOffice Calc: the Python UNO add-in component.

One method per entry of functions.py, made at import from the table; each
passes its cell arguments to acperf_sheet.engine (which calls libacperf through
the SWIG module shipped beside it, in pythonpath/) and turns its errors into
cell errors:
  invalid input (blank, text, not finite, rejected by the library)
      -> an exception, which Calc shows as #VALUE!
  outside the model's range, no solution
      -> NaN, which Calc shows as #NUM! (a whole cell or one cell of a table)

The implementation name org.acperf.calc.Functions is stored in every formula
of every saved workbook: it never changes.
"""

import math

import unohelper
from com.sun.star.lang import XServiceInfo, XServiceName
from com.sun.star.uno import RuntimeException
from org.acperf.calc import XFunctions

from acperf_sheet import engine
from acperf_sheet.functions import FUNCTIONS, IMPLEMENTATION_NAME

_SERVICES = ("com.sun.star.sheet.AddIn", IMPLEMENTATION_NAME)


def _to_cell(result):
    """The method's return value: a text, or a table of numbers (one number is
    a 1x1 table, which Calc shows as the number; NaN shows as #NUM!)."""
    if isinstance(result, str):
        return result
    if isinstance(result, list):
        return tuple(tuple(float(v) for v in row) for row in result)
    return ((float(result),),)


def _method(fn):
    def call(self, *args):
        try:
            return _to_cell(engine.evaluate(fn, args))
        except engine.InvalidInput as e:
            raise RuntimeException(f"{fn.name}: {e}", self)
        except engine.NoResult:
            return ((math.nan,),)
    call.__name__ = fn.method
    call.__doc__ = fn.desc
    return call


class Functions(unohelper.Base, XFunctions, XServiceName, XServiceInfo):
    def __init__(self, ctx=None):
        self.ctx = ctx

    # XServiceName: the name Calc stores in formulas with the method name.
    def getServiceName(self):
        return IMPLEMENTATION_NAME

    # XServiceInfo
    def getImplementationName(self):
        return IMPLEMENTATION_NAME

    def supportsService(self, name):
        return name in _SERVICES

    def getSupportedServiceNames(self):
        return _SERVICES


for _fn in FUNCTIONS:
    setattr(Functions, _fn.method, _method(_fn))

g_ImplementationHelper = unohelper.ImplementationHelper()
g_ImplementationHelper.addImplementation(Functions, IMPLEMENTATION_NAME, _SERVICES)
