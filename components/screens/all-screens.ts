// Every signed-in screen, in one chunk that the sign-in screen does not load (see lazy-screen.tsx).
import AccountScreen from './account';
import EditAlloyScreen from './alloys-id-edit';
import AlloyDetailScreen from './alloys-id';
import ReviewAlloyScreen from './alloys-id-review';
import AlloyVersionsScreen from './alloys-id-versions';
import CompareScreen from './alloys-compare';
import AlloyListScreen from './alloys';
import NewAlloyScreen from './alloys-new';
import CurrencyRatesScreen from './currency-rates';
import FlexPartsScreen from './flex-parts';
import HomeScreen from './home';
import JobScreen from './jobs-id';
import CompareRunScreen from './jobs-id-runs-run-id-compare';
import RunScreen from './jobs-id-runs-run-id';
import NewRunScreen from './jobs-id-runs-new';
import JobSheetScreen from './jobs-id-sheet';
import JobsScreen from './jobs';
import OutboxMessageScreen from './outbox-id';
import OutboxScreen from './outbox';
import QuoteScreen from './quotes-id';
import QuotesScreen from './quotes';
import NewQuoteScreen from './quotes-new';
import ShopSettingsScreen from './shop-settings';
import UsersScreen from './users';
import WeldRulesScreen from './weld-rules';

export const screens = {
  'account': AccountScreen,
  'alloys-id-edit': EditAlloyScreen,
  'alloys-id': AlloyDetailScreen,
  'alloys-id-review': ReviewAlloyScreen,
  'alloys-id-versions': AlloyVersionsScreen,
  'alloys-compare': CompareScreen,
  'alloys': AlloyListScreen,
  'alloys-new': NewAlloyScreen,
  'currency-rates': CurrencyRatesScreen,
  'flex-parts': FlexPartsScreen,
  'home': HomeScreen,
  'jobs-id': JobScreen,
  'jobs-id-runs-run-id-compare': CompareRunScreen,
  'jobs-id-runs-run-id': RunScreen,
  'jobs-id-runs-new': NewRunScreen,
  'jobs-id-sheet': JobSheetScreen,
  'jobs': JobsScreen,
  'outbox-id': OutboxMessageScreen,
  'outbox': OutboxScreen,
  'quotes-id': QuoteScreen,
  'quotes': QuotesScreen,
  'quotes-new': NewQuoteScreen,
  'shop-settings': ShopSettingsScreen,
  'users': UsersScreen,
  'weld-rules': WeldRulesScreen,
};

export type ScreenName = keyof typeof screens;
