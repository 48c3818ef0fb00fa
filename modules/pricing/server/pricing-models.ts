import type { PriceLine } from '@/modules/pricing/core/pricing';
import type { PricingRules } from '@/modules/pricing/core/pricing-rules';
import type { OfferAnswer } from '@/modules/pricing/core/offer-input';
import { BaseModel } from '@/server/db/base-model';

// None of these is a generated read type: their money reaches the screens through hand-written
// resolvers that check the reader's role field by field (pricing-graphql.ts).

export class PricingRuleSet extends BaseModel {
  static tableName = 'pricing_rule_sets';
  static hasUpdatedAt = false;
  static jsonAttributes = ['rules'];
  id!: number;
  version!: string;
  rules!: PricingRules;
  createdById!: number | null;
  createdAt!: string;
}

export class TradeInAnswer extends BaseModel {
  static tableName = 'trade_in_answers';
  static hasUpdatedAt = false;
  static jsonAttributes = ['lines'];
  id!: number;
  pianoId!: number;
  assessmentId!: number;
  pricingRulesVersion!: string;
  rateCardVersion!: string;
  currency!: string;
  basis!: 'retail' | 'wholesale';
  provisional!: boolean;
  offerMinor!: number;
  lines!: PriceLine[];
  answer!: OfferAnswer;
  counterMinor!: number | null;
  allowanceMinor!: number | null;
  note!: string | null;
  recordedById!: number;
  recordedAt!: string;
}

export class PriceChange extends BaseModel {
  static tableName = 'price_changes';
  static hasUpdatedAt = false;
  id!: number;
  pianoId!: number;
  fromMinor!: number | null;
  toMinor!: number;
  currency!: string;
  suggestedMinor!: number | null;
  pricingRulesVersion!: string | null;
  reason!: string;
  changedById!: number | null;
  changedAt!: string;
}
