// The disclosure desk's GraphQL types: versions, what a publish answers, acknowledgements, shop texts.
import { GraphQLInt, GraphQLString } from 'graphql';

import { bool, CurrencyType, input, int, list, nn, object, optStr, str } from '@/server/graphql/types';

const VersionType = object('DisclosureVersion', { id: int, version: int, digest: str, publishedAt: str });
export const DisclosureVersionsType = object('DisclosureVersions', { token: { type: GraphQLString, description: 'The public link’s token; null before the first publish.' }, versions: list(VersionType) });

export const PublishedType = object('PublishedDisclosure', {
  version: int,
  digest: str,
  token: str,
  url: str,
  publishedAt: str,
  unchanged: { ...bool, description: 'Nothing had changed: the newest version stays.' },
});

export const AcknowledgementType = object('Acknowledgement', {
  id: int,
  version: int,
  buyerName: str,
  buyerEmail: str,
  digest: str,
  acknowledgedAt: str,
  countersignedBy: optStr,
  countersignedAt: optStr,
  hasPdf: bool,
});

export const CountersignedType = object('Countersigned', { id: int, countersignedAt: str, countersignedBy: str });

export const ShopTextsType = object('ShopTexts', { dealerName: str, warranty: str }, 'The dealer’s name and the warranty text new disclosures carry.');
export const ShopTextsInputType = input('ShopTextsInput', { dealerName: nn(GraphQLString), warranty: nn(GraphQLString) });

// Whole minor units are checked by the domain's schema, which says so in words.
export const AskingPriceInputType = input('AskingPriceInput', { pianoId: nn(GraphQLInt), askingPriceMinor: nn(GraphQLInt), currency: nn(CurrencyType), reason: GraphQLString });
