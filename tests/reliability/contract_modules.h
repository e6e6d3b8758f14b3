/* Modules covered by the reliability contract: one line each, in call order.
   tests/reliability/coverage.sh requires every function declared in
   libperf/include/acperf/<module>.h to appear in contract_<module>.c and in
   the domain audit (tests/c/test_domain.c). */
CONTRACT_MODULE(status)
CONTRACT_MODULE(units)
CONTRACT_MODULE(atmosphere)
CONTRACT_MODULE(airspeed)
CONTRACT_MODULE(friction)
