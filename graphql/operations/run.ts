import { gql } from "@apollo/client";

// Everything the run page plots: the run's series (thinned for drawing on the
// server; derivations always used the full data), stress samples, grid study,
// quantities with their bands and details, and the case's fit settings.
export const RUN_PLOTS_QUERY = gql`
  query RunPlots($runId: ID!, $caseKey: String!, $maxPoints: Int!) {
    run(id: $runId) {
      id
      case
      model
      status
      plotSeries(maxPoints: $maxPoints) {
        key
        x
        y
        totalPoints
      }
      stresses {
        at
        uu
        vv
        ww
        uv
        uw
        vw
        k
        eta
        xi
        lumleyF
        barycentricX
        barycentricY
        realizable
        violations
      }
      gridStudy {
        quantity
        cells
        values
        dimension
        convergence
        observedOrder
        extrapolatedValue
        gciFinePct
        eaPct
        eextPct
      }
      coefficients {
        name
        value
      }
      quantities {
        key
        label
        unit
        value
        origin
        verdict
        reference
        source
        lower
        upper
        deviation
        deviationPct
        baselineValue
        baselineDelta
        drift
        driftReason
        details
        bandKind
        bandModel
      }
    }
    case(key: $caseKey) {
      key
      title
      parameters
    }
    quantities {
      key
      label
      unit
    }
  }
`;
