/** The grade as every screen reads it: findings with their work, the areas inspected and the verdict. */
export const GRADE_PARTS = /* GraphQL */ `
  fragment GradeParts on Grade {
    rulesVersion
    findings { area check mark finding work { task hours quantity note alternativeTo } mustDisclose fields }
    inspectedAreas minInspectedAreas provisional playTested readiness referToTechnician notRecommendedForRetail centsFromStandard
  }
`;
