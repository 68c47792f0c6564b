import { PaymentEventRow, PaymentRow } from "../payments/payment.entity.js";
import { FirmSettingsRow } from "../price-book/firm-settings.entity.js";
import { PriceBookItem } from "../price-book/price-book-item.entity.js";
import { ProposalCommentRow } from "../proposals/proposal-comment.entity.js";
import { ProposalVersionRow } from "../proposals/proposal-version.entity.js";
import { ProposalRow } from "../proposals/proposal.entity.js";
import { OptionSearchRow } from "../scenarios/option-search.entity.js";
import { ScenarioRow } from "../scenarios/scenario.entity.js";
import { VerificationRow } from "../work-orders/verification.entity.js";
import { WorkOrderRow, WorkOrderTaskRow } from "../work-orders/work-order.entity.js";

/** Entities of price book, scenarios, proposals, payments, work orders and verification. */
export const moneyEntities = [
  PriceBookItem, FirmSettingsRow, ScenarioRow, OptionSearchRow, ProposalRow, ProposalVersionRow, ProposalCommentRow, PaymentRow, PaymentEventRow, WorkOrderRow, WorkOrderTaskRow, VerificationRow,
];
