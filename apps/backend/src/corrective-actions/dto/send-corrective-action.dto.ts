import { SupplierMailDto } from '../../common/supplier-mail.dto';

/** E-mails the supplier a link to answer the request. */
export class SendCorrectiveActionDto extends SupplierMailDto {}
